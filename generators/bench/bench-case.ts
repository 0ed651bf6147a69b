/** What one run of a benchmark case reports. */
export interface BenchOutcome {
  /** Paths tracked. */
  readonly paths: number;
  /** Distinct solutions found (compare with `expected`). */
  readonly found: number;
  readonly failedPaths: number;
  /** Accepted steps per path, when the case tracks paths itself. */
  readonly steps?: readonly number[];
}

/**
 * One benchmark case. A suite is a file generators/bench/<name>-suite.ts exporting `cases: BenchCase[]`; the
 * runner (run.ts) finds every such file by itself, so adding a suite needs no edit elsewhere.
 */
export interface BenchCase {
  readonly name: string;
  /** The published count the case should find (found = expected when nothing is lost). */
  readonly expected: number;
  run(): Promise<BenchOutcome>;
}
