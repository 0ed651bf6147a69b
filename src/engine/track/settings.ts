/**
 * Tracker settings. Distances are relative: a correction δ counts as ‖Δx‖∞ / (1 + ‖x‖∞). Steps are measured
 * in |Δt|. Defaults follow the measured trade-offs in the project's five-conic notes (predictor error about
 * 1e-3, first correction at most 2e-2, corrector 1e-7 along the path, 1e-12 at the end).
 */
export interface TrackerSettings {
  /** Largest step |Δt|. */
  readonly maxStep: number;
  /** Smallest step before the path fails with 'step-underflow', relative to the length of the segment being tracked. */
  readonly minStep: number;
  /** Attempted steps (accepted + rejected) per path before 'step-budget'. */
  readonly maxSteps: number;
  /** The first Newton correction after a prediction must be at most this (else the step is refused). */
  readonly maxFirstCorrection: number;
  /** Target size of the first correction; the step grows or shrinks toward it (RK4: error ∝ h⁵). */
  readonly predictorTolerance: number;
  /** Newton along the path stops when a correction is at most this. */
  readonly correctorTolerance: number;
  /**
   * Opt-in (default false): the corrector also stops after its second correction δ when that one contracted
   * strongly (θ = δ / first correction ≤ 0.01) and the error it leaves, estimated as θ/(1 − θ)·δ (Deuflhard, Newton
   * Methods for Nonlinear Problems, 2004, §2.1), is at most correctorTolerance; saves the third Newton iteration of most steps.
   */
  readonly estimateCorrectorError?: boolean;
  /** Newton iterations per step; more, and the step is refused. */
  readonly maxCorrectorIterations: number;
  /** Each Newton correction must be at most this fraction of the previous one (else the step is refused: no path jumping). */
  readonly contraction: number;
  /** Distance from the end of the path at which the endgame takes over (0 disables the endgame). */
  readonly endgameStart: number;
  /** Newton at the end stops at this correction. */
  readonly finalTolerance: number;
  /** An end whose Jacobian condition estimate exceeds this is singular. */
  readonly singularCondition: number;
  /** Cauchy endgame: samples per loop, largest winding number, radius ratio per round, rounds. */
  readonly loopSamples: number;
  readonly maxWinding: number;
  readonly radiusRatio: number;
  readonly maxRounds: number;
  /** Cauchy endgame: two successive estimates agreeing to this are accepted. */
  readonly endgameTolerance: number;
  /** How many times a failed path is re-tracked with stricter settings. */
  readonly retries: number;
  /**
   * 'double' (default), or 'double-double': every Newton correction (corrector, final Newton, residual checks) uses
   * the homotopy's evaluateValueExtended, so that in the style of iterative refinement with extra-precise residuals
   * Newton converges to the double nearest the path wherever κ·2⁻⁵³ < 1, instead of stalling at κ·2⁻⁵³; the
   * endgame may then sample up to condition 1e15 (1e12 in double). Ignored by homotopies without it.
   */
  readonly precision?: 'double' | 'double-double';
}

/** The default settings (see TrackerSettings for the meaning of each). */
export const DEFAULT_TRACKER_SETTINGS: TrackerSettings = {
  maxStep: 0.1,
  minStep: 1e-14,
  maxSteps: 4000,
  maxFirstCorrection: 2e-2,
  predictorTolerance: 1e-3,
  correctorTolerance: 1e-7,
  maxCorrectorIterations: 3,
  contraction: 0.3,
  endgameStart: 0.1,
  finalTolerance: 1e-12,
  singularCondition: 1e10,
  loopSamples: 8,
  maxWinding: 16,
  radiusRatio: 0.25,
  maxRounds: 10,
  endgameTolerance: 1e-9,
  retries: 2,
};

/** Settings for retry number k ≥ 1: smaller steps and a tighter corrector, scaled by 4^k (and a larger step budget). */
export function stricterSettings(base: TrackerSettings, k: number): TrackerSettings {
  const f = 4 ** k;
  return {
    ...base,
    maxStep: base.maxStep / f,
    maxSteps: base.maxSteps * f,
    maxFirstCorrection: base.maxFirstCorrection / f,
    predictorTolerance: base.predictorTolerance / f,
    correctorTolerance: base.correctorTolerance / f,
    contraction: Math.min(base.contraction, 0.25),
  };
}
