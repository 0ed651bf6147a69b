/** Where the paths of one naive total-degree run on a conic problem's sextic formulation ended (they add up to `paths`). */
export interface NaiveRunFigures {
  readonly slug: string;
  readonly instance: string;
  /** The homotopy's seed, and the engine version that measured the figures. */
  readonly seed: number;
  readonly engineVersion: string;
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
  /** The rank-one test: largest 2×2 minor of the conic matrix ≤ this × (largest entry)². */
  readonly rankOneTolerance: number;
}

/**
 * The naive 7776-path run on the five-conic problem (generic instance, homotopy seed 1), as measured by
 * generators/bench/naive-run-check.ts on two workers (27.8 s); that script re-measures and says when these differ.
 */
export const NAIVE_FIVE_CONICS_RUN: NaiveRunFigures = {
  slug: 'conics-tangent-to-5-conics',
  instance: 'generic',
  seed: 1,
  engineVersion: '0.2.0',
  paths: 7776,
  genuine: 3264,
  genuinePaths: 3264,
  excessPaths: 4512,
  doubleLinePaths: 4512,
  singularPaths: 0,
  atInfinityPaths: 0,
  failedPaths: 0,
  extendedPaths: 4518,
  recoveredJumps: 1,
  rankOneTolerance: 1e-4,
};
