import type { PathEnd } from '../homotopy.ts';

/** Options of solveSystem. Same seed ⇒ identical report (whatever `workers` and `shard`). */
export interface SolveOptions {
  seed: number;
  start?: 'total-degree' | 'multihomogeneous';
  /** 0 or undefined: in-process; k > 0: a pool of k workers (Node worker_threads). */
  workers?: number;
  /** Track only this batch of paths: paths ⌊total·index/count⌋ … ⌊total·(index+1)/count⌋ − 1. */
  shard?: { index: number; count: number };
  onProgress?: (done: number, total: number) => void;
}

/** One distinct finite solution (or singular cluster). */
export interface FoundSolution {
  /** Packed complex, affine unknowns in system order. */
  point: Float64Array;
  /** ‖F(x)‖∞ / (1 + ‖x‖∞). */
  residual: number;
  /** κ₁ estimate of ∂F/∂x (Infinity when numerically singular). */
  condition: number;
  /** Number of paths ending here (for a singular cluster, the multiplicity estimate). */
  multiplicity: number;
  real: boolean;
  /** Indices of the paths ending here, ascending. */
  paths: number[];
}

/** Path counts that add up: tracked = regular + singular + excess + atInfinity + failed. */
export interface PathStatistics {
  tracked: number;
  regular: number;
  singular: number;
  /** Paths ending on a positive-dimensional solution set (see PathOutcome 'excess'). */
  excess: number;
  atInfinity: number;
  failed: number;
  failures: Record<string, number>;
  stepsMedian: number;
  stepsMax: number;
  /** Total re-tracks (stricter settings, double-double precision), over all paths. */
  retries: number;
}

/** The bounds and start system a report carries. */
export interface SolveBounds {
  bezoutBound: number;
  multihomogeneousBound: number | null;
  startSystem: 'total-degree' | 'multihomogeneous';
}

/** What the solver's review of the ends did: path-jump recovery and re-tracking in double-double precision. */
export interface RetrackSummary {
  /** Paths re-tracked because they ended at the same nonsingular point as another path. */
  jumpPaths: number;
  /** Of those, paths whose re-track ended at a different point: jumps recovered. */
  recoveredJumps: number;
  /** Paths still sharing a nonsingular end with another after every re-track (each shows as multiplicity > 1). */
  unresolvedJumps: number;
  /** Paths re-tracked in double-double precision because they failed or ended undecided in double precision. */
  extendedPaths: number;
  /** Of those, paths whose re-track reached a verdict other than 'failed' or undecided. */
  extendedDecided: number;
}

/** What solveSystem returns. */
export interface SolveReport extends SolveBounds {
  /** One per tracked path, in path order (affine coordinates where finite, see toAffineEnd). */
  ends: PathEnd[];
  /** Distinct finite nonsingular solutions, refined, sorted deterministically. */
  solutions: FoundSolution[];
  /** Distinct finite singular clusters with multiplicity estimates. */
  singular: FoundSolution[];
  stats: PathStatistics;
  /** The review of the ends (absent when the solve made no review, e.g. post-processing of merged shards). */
  retracks?: RetrackSummary;
  seconds: number;
}
