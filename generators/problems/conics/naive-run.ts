import type { PathEnd } from '../../../src/engine/homotopy.ts';
import type { ProblemDefinition } from '../../../src/atlas/definition.ts';
import { systemOf } from '../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../src/atlas/parameters-of.ts';
import { solveSystem } from '../../../src/engine/solve/solve-system.ts';

/** Where the paths of the naive total-degree run on the sextic formulation ended (they add up to `paths`). */
export interface NaiveRunSummary {
  readonly slug: string;
  readonly instance: string;
  readonly seed: number;
  readonly bezoutBound: number;
  readonly paths: number;
  /** Distinct nonsingular conics found, and the paths that reached them. */
  readonly genuine: number;
  readonly genuinePaths: number;
  /** Paths the engine judged 'excess' (on a positive-dimensional solution set), and of those the ones at a double line. */
  readonly excessPaths: number;
  readonly doubleLinePaths: number;
  readonly singularPaths: number;
  readonly atInfinityPaths: number;
  readonly failedPaths: number;
  /** Paths re-tracked in double-double precision, and jumps recovered. */
  readonly extendedPaths: number;
  readonly recoveredJumps: number;
  readonly stepsMedian: number;
  readonly seconds: number;
  /** The rank-one test: largest 2×2 minor of the conic matrix ≤ this × (largest entry)². */
  readonly rankOneTolerance: number;
}

/** max |2×2 minor| / max |entry|² of the symmetric conic matrix of a packed complex (a, …, f): 0 exactly on double lines. */
export function rankOneDefect(x: Float64Array): number {
  const c = (k: number, s = 1): [number, number] => [s * x[2 * k]!, s * x[2 * k + 1]!];
  const m: [number, number][][] = [[c(0), c(1, 0.5), c(3, 0.5)], [c(1, 0.5), c(2), c(4, 0.5)], [c(3, 0.5), c(4, 0.5), c(5)]];
  let minor = 0, entry = 0;
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) entry = Math.max(entry, Math.hypot(...m[i]![j]!));
  for (const [r0, r1] of [[0, 1], [0, 2], [1, 2]]) for (const [c0, c1] of [[0, 1], [0, 2], [1, 2]]) {
    const [ar, ai] = m[r0!]![c0!]!, [br, bi] = m[r1!]![c1!]!, [cr, ci] = m[r0!]![c1!]!, [dr, di] = m[r1!]![c0!]!;
    minor = Math.max(minor, Math.hypot(ar * br - ai * bi - (cr * dr - ci * di), ar * bi + ai * br - (cr * di + ci * dr)));
  }
  return entry === 0 ? Infinity : minor / (entry * entry);
}

/**
 * Runs the naive total-degree homotopy on a conic problem's shown (sextic) formulation at one instance, on `workers`
 * workers, and summarises where the paths ended, as the engine judged them; excess ends are also checked to be
 * double lines (rank-one conic matrix, the excess component).
 */
export async function naiveRun(definition: ProblemDefinition, instanceId: string, seed: number, workers: number, rankOneTolerance = 1e-4): Promise<NaiveRunSummary> {
  const instance = definition.instances.find((i) => i.id === instanceId);
  if (!instance) throw new Error(`problem "${definition.slug}": no instance "${instanceId}"`);
  const system = systemOf(definition), parameters = parametersOf(definition, instance);
  const report = await solveSystem(system, parameters, { seed, start: 'total-degree', workers });
  const excess = report.ends.filter((e: PathEnd) => e.outcome === 'excess');
  return {
    slug: definition.slug, instance: instanceId, seed, bezoutBound: report.bezoutBound, paths: report.ends.length,
    genuine: report.solutions.length, genuinePaths: report.stats.regular,
    excessPaths: excess.length, doubleLinePaths: excess.filter((e) => rankOneDefect(e.point) <= rankOneTolerance).length,
    singularPaths: report.stats.singular, atInfinityPaths: report.stats.atInfinity, failedPaths: report.stats.failed,
    extendedPaths: report.retracks?.extendedPaths ?? 0, recoveredJumps: report.retracks?.recoveredJumps ?? 0,
    stepsMedian: report.stats.stepsMedian, seconds: report.seconds, rankOneTolerance,
  };
}
