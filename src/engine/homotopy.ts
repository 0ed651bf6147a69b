/**
 * The contract between the path tracker and whatever it tracks. All complex vectors are packed Float64Arrays
 * (re, im interleaved): a vector of n complex numbers has length 2n; an n×n complex matrix is row-major with
 * length 2n², entry (i, j) at [2(i·n + j), 2(i·n + j) + 1].
 *
 * A homotopy H(x, t) runs from a start system at t = 0 to the target system at t = 1. The path parameter t is
 * complex so that endgames may loop around t = 1 (Cauchy endgame); ordinary tracking keeps tIm = 0.
 */
export interface Homotopy {
  /** Number of complex unknowns (and equations: the system is square). */
  readonly n: number;
  /** Fills h = H(x, t) (length 2n), jac = ∂H/∂x (length 2n²) and ht = ∂H/∂t (length 2n). Allocates nothing. */
  evaluate(x: Float64Array, tRe: number, tIm: number, h: Float64Array, jac: Float64Array, ht: Float64Array): void;
  /** Fills h = H(x, t) only; optional fast path for residual checks. Allocates nothing. */
  evaluateValue?(x: Float64Array, tRe: number, tIm: number, h: Float64Array): void;
  /**
   * Optional: fills h = H(x, t) evaluated in double-double arithmetic (about 32 digits; x and t taken as exact
   * doubles), rounded to double. With it the tracker can run in extended precision (TrackerSettings.precision):
   * Newton's corrections then see the residual's true value rather than its rounding noise. Allocates nothing.
   */
  evaluateValueExtended?(x: Float64Array, tRe: number, tIm: number, h: Float64Array): void;
  /** A linear solver fitted to this homotopy's Jacobian structure (block elimination, say); dense LU if absent. */
  createSolver?(): LinearSolver;
  /**
   * Optional: the relative distance of x (this homotopy's coordinates, in projective charts) from the
   * hyperplane at infinity of the target's affine space, e.g. min over groups of |h_g| / max_j |X_j|.
   * Lets the tracker report 'at-infinity' (distance ≤ 1e-8, or a steady positive valuation in the endgame).
   */
  infinityDistance?(x: Float64Array): number;
  /** Optional, with groupInfinityDistance: how many projective groups the coordinates form. */
  readonly infinityGroups?: number;
  /** Optional: the relative distance to infinity in group g alone (infinityDistance is the minimum over the groups). */
  groupInfinityDistance?(x: Float64Array, group: number): number;
}

/** Factor-then-solve for one n×n complex matrix at a time; buffers are owned by the solver and reused. */
export interface LinearSolver {
  /**
   * Factors the matrix (which the solver may overwrite) and returns an estimate of its condition number in
   * the 1-norm or ∞-norm (within a factor of about n of the true value); Infinity when the matrix is
   * numerically singular (a zero pivot).
   */
  factor(matrix: Float64Array): number;
  /** Optional: factors like `factor` without the condition estimate (faster); false when numerically singular. */
  factorOnly?(matrix: Float64Array): boolean;
  /** Solves A·out = b with the last factored matrix; `out` may alias `b`. Allocates nothing. */
  solve(b: Float64Array, out: Float64Array): void;
}

/**
 * How a tracked path ended. Every tracked path gets exactly one of these: 'regular' (a finite nonsingular solution),
 * 'singular' (an isolated finite singular solution), 'excess' (a point of a positive-dimensional solution set, where
 * the naive count's excess goes), 'at-infinity', or 'failed' (the tracker could not follow the path to its end).
 */
export type PathOutcome = 'regular' | 'singular' | 'excess' | 'at-infinity' | 'failed';

/** Why a path failed, when it did. */
export type FailureReason = 'step-underflow' | 'step-budget' | 'no-convergence' | 'non-finite';

/** The end of one tracked path, in the target system's own (affine) coordinates where finite. */
export interface PathEnd {
  readonly outcome: PathOutcome;
  /** The endpoint (packed complex, length 2n); for 'at-infinity' and 'failed' it is the last point reached. */
  readonly point: Float64Array;
  /** true when `point` is a direction at infinity (X_0 … X_{n−1}) / max_j |X_j| rather than a finite point. */
  readonly direction?: true;
  /**
   * Present when the tracker could not confirm its verdict in this precision: for an end the endgame could not decide
   * ('failed', or 'singular' with winding number 0), the path's point (homotopy coordinates) at real t = resumeAt where
   * the endgame began; for a 'singular' end whose loop estimate (winding number above 1) the path could not be checked
   * against inward, the sample the estimate rests on. A re-track of the end alone, Tracker.track(resumeFrom,
   * resumeAt, tEnd), starts there.
   */
  readonly resumeFrom?: Float64Array;
  readonly resumeAt?: number;
  /** ‖H(x, 1)‖∞ / (1 + ‖x‖∞) at the endpoint. */
  readonly residual: number;
  /** Condition estimate of ∂H/∂x at the endpoint (Infinity when singular). */
  readonly condition: number;
  /** Estimated winding number (multiplicity indicator) from the endgame; 1 for regular ends; 0 when undetermined. */
  readonly windingNumber: number;
  /** Accepted predictor–corrector steps. */
  readonly steps: number;
  /** Steps rejected (Newton did not contract, or the predictor error was too large). */
  readonly rejectedSteps: number;
  /** How many times the path was retried with stricter settings before this result. */
  readonly retries: number;
  /** Present only for 'failed'. */
  readonly failure?: FailureReason;
  /**
   * Present when the solver tracked the path again after its first end: why ('jump': its nonsingular end coincided
   * with another path's; 'failed' or 'undecided': it failed, or ended singular with no winding number, in double
   * precision), in which precision the end now shown was reached, and whether the re-track changed the end.
   */
  readonly retrack?: PathRetrack;
}

/** Why and how a path was tracked again (see PathEnd.retrack). */
export interface PathRetrack {
  readonly reason: 'jump' | 'failed' | 'undecided';
  readonly precision: 'double' | 'double-double';
  readonly changed: boolean;
}
