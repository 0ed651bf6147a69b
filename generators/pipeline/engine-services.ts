import type { PathEnd, PolynomialSystem } from '../../src/engine/index.ts';
import type { ProblemDefinition } from '../../src/atlas/definition.ts';
import type { Completeness, MonodromyGroup, RetrackStats } from '../../src/atlas/record.ts';

/** One distinct solution the engine reports (H1's FoundSolution): packed complex point in the unknowns. */
export interface EngineSolution {
  readonly point: Float64Array;
  readonly residual: number;
  readonly condition: number;
  readonly multiplicity: number;
  readonly real: boolean;
  readonly paths: readonly number[];
}

/** The bounds and start system a report carries (H1's SolveBounds). */
export interface SolveBounds {
  readonly bezoutBound: number;
  readonly multihomogeneousBound: number | null;
  readonly startSystem: 'total-degree' | 'multihomogeneous';
}

/** What a solve strategy returns (H1's SolveReport; H6's parameter homotopy returns the same shape). */
export interface EngineReport {
  readonly bezoutBound: number;
  readonly multihomogeneousBound?: number | null;
  readonly startSystem?: string;
  /** Per solution, the indices of the paths that ended there. */
  readonly ends: readonly PathEnd[];
  readonly solutions: readonly EngineSolution[];
  readonly singular: readonly EngineSolution[];
  readonly stats: {
    readonly tracked: number;
    readonly regular: number;
    readonly singular: number;
    readonly excess: number;
    readonly atInfinity: number;
    readonly failed: number;
    readonly failures: Readonly<Record<string, number>>;
    readonly stepsMedian: number;
    readonly stepsMax: number;
    readonly retries: number;
  };
  /** What the review of the ends did (total-degree and multihomogeneous solves; see src/engine/solve/types.ts). */
  readonly retracks?: RetrackStats;
  readonly seconds: number;
}

/** Progress of one solve: paths done out of the total. */
export interface EngineProgress {
  readonly done: number;
  readonly total: number;
}

/** Options handed to a strategy. `shard` asks for path batch `index` of `count` (0-based) only. */
export interface StrategyOptions {
  readonly seed: number;
  readonly workers?: number;
  readonly shard?: { readonly index: number; readonly count: number };
  readonly onProgress?: (progress: EngineProgress) => void;
}

/** One solve strategy: a label for the record's `method`, and the solve itself. */
export interface SolveStrategy {
  readonly label: string;
  /** Whether the strategy honours `shard` (path batches merged later by `collect`). */
  readonly shardable: boolean;
  readonly solve: (system: PolynomialSystem, parameters: Float64Array, options: StrategyOptions, definition: ProblemDefinition) => Promise<EngineReport>;
}

/** The certifier's verdict (H5's certifySolutions). */
export interface CertifyReport {
  /** Per solution; `box` (4 numbers per unknown: reLo, reHi, imLo, imHi) is where Krawczyk's test passed, when reported. */
  readonly solutions: readonly { readonly certified: boolean; readonly certifiedReal: boolean; readonly box?: Float64Array }[];
  readonly certified: number;
  readonly certifiedDistinct: number;
  readonly certifiedReal: number;
  readonly seconds: number;
}

/** What the completeness checks found: solutions the solve missed (refined, in the unknowns) and the record's block. */
export interface CompletenessReport {
  readonly recovered: readonly { readonly point: Float64Array; readonly residual: number; readonly condition: number }[];
  readonly checks: Completeness;
  readonly seconds: number;
}

/**
 * Everything the pipeline needs from the engine, injected so tests can use a small fake and production wires the
 * real engine (generators/pipeline/real-engine.ts): strategies by SolverChoice kind, certification, shard merging.
 */
export interface EngineServices {
  readonly version: string;
  readonly strategies: Readonly<Record<string, SolveStrategy>>;
  /** Certifies the points; `workers` (≥ 2) may spread the work over threads, with the same verdict as one thread. */
  readonly certify: (system: PolynomialSystem, parameters: Float64Array, points: Float64Array[], options: { realParameters: boolean; workers?: number }) => Promise<CertifyReport> | CertifyReport;
  /** The last step of a sharded solve: the ends of every shard, in path order, into the report a single run gives (seed: the instance's). */
  readonly collect: (system: PolynomialSystem, parameters: Float64Array, ends: readonly PathEnd[], bounds: SolveBounds, seed: number) => Promise<EngineReport> | EngineReport;
  /**
   * Optional: the completeness checks after a solve (monodromy recovery, trace test) on the found nonsingular
   * solutions; absent in engines without them (the record then carries no completeness block).
   */
  readonly complete?: (system: PolynomialSystem, parameters: Float64Array, points: readonly Float64Array[], options: { seed: number; workers?: number }) => Promise<CompletenessReport>;
  /**
   * Optional: the monodromy group of a generic instance's distinct nonsingular solutions by random loops (seeded);
   * absent in engines without it (the record then carries no group).
   */
  readonly group?: (system: PolynomialSystem, parameters: Float64Array, points: readonly Float64Array[], options: { seed: number; workers?: number; definition?: ProblemDefinition }) => Promise<MonodromyGroup>;
  /** Ends any worker threads the engine started (the CLI calls it once a command is done); absent when there are none. */
  readonly close?: () => Promise<void>;
}
