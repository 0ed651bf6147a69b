import type { FailureReason, Homotopy, PathEnd, PathOutcome } from '../homotopy.ts';
import { allFinite } from '../complex/packed.ts';
import { createStepper, type SegmentStatus, type Stepper } from './stepper.ts';
import { createCauchyEndgame, infinityProbe } from './cauchy-endgame.ts';
import { DEFAULT_TRACKER_SETTINGS, stricterSettings, type TrackerSettings } from './settings.ts';

/**
 * A nonsingular end is at infinity when its distance to infinity (homotopy.infinityDistance) is at most this many
 * times κ·2⁻⁵², its attainable accuracy after Newton's method (κ the condition estimate there): zero to within
 * rounding. Any larger distance is a finite end, however large its affine coordinates.
 */
export const INFINITY_ACCURACY_FACTOR = 64;
/** Attempted steps allowed for the straight final approach before the Cauchy endgame takes over. */
const APPROACH_ATTEMPTS = 40;
/** Angle (radians) by which a retry turns the endgame's ray into the complex t-plane (common practice, no source). */
const RETRY_TURN = 0.5;

/** A path tracker bound to one homotopy; buffers are made once here and reused for every path. */
export interface Tracker {
  readonly stepper: Stepper;
  readonly settings: TrackerSettings;
  /**
   * Tracks one path from `start` (packed complex, length 2n, not modified) at real t = tStart to tEnd and returns
   * its end in the homotopy's own coordinates. Stages: predictor–corrector to tEnd ∓ endgameStart; a straight
   * approach to tEnd (≤ 40 attempts, aborted when the condition estimate passes singularCondition); else the
   * Cauchy endgame. A failed path is re-tracked up to settings.retries times with stricterSettings, its endgame ray
   * turned by ±0.5 rad into the complex plane (t = tEnd + r·u·e^{±0.5i}); steps and
   * rejections are summed over all attempts. Outcome 'at-infinity' needs homotopy.infinityDistance.
   * windingNumber is 0 for a singular end whose loops never settled (undetermined).
   */
  track(start: Float64Array, tStart?: number, tEnd?: number): PathEnd;
}

/** Creates a tracker; `settings` override DEFAULT_TRACKER_SETTINGS field by field. */
export function createTracker(homotopy: Homotopy, settings: Partial<TrackerSettings> = {}): Tracker {
  const base: TrackerSettings = { ...DEFAULT_TRACKER_SETTINGS, ...settings };
  const stepper = createStepper(homotopy, base);
  const endgame = createCauchyEndgame(stepper, infinityProbe(homotopy));
  const len = 2 * homotopy.n;
  const saved = new Float64Array(len);
  /** Whether `saved` holds this attempt's point where the endgame began (the main segment got there). */
  let reachedEndgame = false;

  /** Set by an attempt whose endgame accepted a provisional estimate on its real ray: where a re-track of the end may start. */
  let provisionalAt = NaN;
  const provisionalSample = new Float64Array(len);

  function attempt(x: Float64Array, tStart: number, tEnd: number, retry: number): { status: SegmentStatus; winding: number; diverged: boolean } {
    const s = stepper.settings;
    const span = Math.abs(tEnd - tStart);
    const u = tStart < tEnd ? -1 : 1;
    reachedEndgame = false;
    provisionalAt = NaN;
    if (s.endgameStart <= 0) {
      const status = stepper.segment(x, tStart, 0, tEnd, 0);
      if (status === 'ok') stepper.newton(x, tEnd, 0, s.finalTolerance, 6);
      return { status, winding: 1, diverged: false };
    }
    // a start within endgameStart of the end (a resumed end) goes straight to the approach and the endgame
    const r0 = Math.min(span, s.endgameStart);
    const tE = tEnd + u * r0;
    const status = tE === tStart ? 'ok' : stepper.segment(x, tStart, 0, tE, 0);
    if (status !== 'ok') return { status, winding: 1, diverged: false };
    saved.set(x);
    reachedEndgame = true;
    const approach = stepper.segment(x, tE, 0, tEnd, 0, s.singularCondition, APPROACH_ATTEMPTS);
    if (approach === 'ok' && stepper.newton(x, tEnd, 0, s.finalTolerance, 6) && stepper.condition <= s.singularCondition) {
      return { status: 'ok', winding: 1, diverged: false };
    }
    x.set(saved);
    // retry k approaches the end along the ray t = tEnd + r·u·e^{iθ}, θ = ±RETRY_TURN (sign alternating): the
    // endgame's samples then avoid a near-singularity just off the real segment, which no step size gets past
    const theta = retry === 0 ? 0 : (retry % 2 === 1 ? 1 : -1) * RETRY_TURN;
    const uRe = u * Math.cos(theta), uIm = u * Math.sin(theta);
    if (retry > 0) {
      const turned = stepper.segment(x, tE, 0, tEnd + r0 * uRe, r0 * uIm);
      if (turned !== 'ok') return { status: turned, winding: 1, diverged: false };
    }
    const result = endgame(x, tEnd, 0, uRe, uIm, r0);
    if (result.status === 'ok' && result.provisional) {
      // on a turned ray the sample sits at complex t: resume from where the endgame began instead
      provisionalSample.set(uIm === 0 ? result.sample : saved);
      provisionalAt = uIm === 0 ? tEnd + uRe * result.sampleRadius : tE;
    }
    if (result.status === 'ok' && result.winding === 1 && !result.diverged) stepper.newton(x, tEnd, 0, s.finalTolerance, 6);
    return { status: result.status, winding: result.winding, diverged: result.diverged };
  }

  function track(start: Float64Array, tStart = 0, tEnd = 1): PathEnd {
    if (start.length !== len) throw new RangeError(`start point has length ${start.length}, expected ${len} (packed complex, n = ${homotopy.n})`);
    let steps = 0, rejected = 0;
    for (let k = 0; ; k++) {
      stepper.settings = k === 0 ? base : stricterSettings(base, k);
      stepper.steps = 0;
      stepper.rejected = 0;
      stepper.stepSize = stepper.settings.maxStep / 4;
      const x = Float64Array.from(start);
      const { status, winding, diverged } = attempt(x, tStart, tEnd, k);
      steps += stepper.steps;
      rejected += stepper.rejected;
      const finite = allFinite(x, len);
      if ((status === 'ok' && finite) || k >= base.retries) {
        const failure: FailureReason | undefined = !finite ? 'non-finite' : status === 'ok' ? undefined : status === 'ill-conditioned' ? 'no-convergence' : status;
        const end = finish(x, tEnd, winding, diverged, steps, rejected, k, failure);
        // an end the endgame could not decide keeps the point where the endgame began, and a provisional singular end
        // the sample its estimate rests on, so that only the end is re-tracked in extended precision
        const undecided = end.outcome === 'failed' || (end.outcome === 'singular' && end.windingNumber === 0);
        if (undecided && reachedEndgame) return { ...end, resumeFrom: Float64Array.from(saved), resumeAt: tEnd + (tStart < tEnd ? -1 : 1) * Math.min(Math.abs(tEnd - tStart), base.endgameStart) };
        if (end.outcome === 'singular' && !Number.isNaN(provisionalAt)) return { ...end, resumeFrom: Float64Array.from(provisionalSample), resumeAt: provisionalAt };
        return end;
      }
    }
  }

  function finish(x: Float64Array, tEnd: number, winding: number, diverged: boolean, steps: number, rejectedSteps: number, retries: number, failure?: FailureReason): PathEnd {
    const residual = allFinite(x, len) ? stepper.residual(x, tEnd, 0) : Infinity;
    const condition = Number.isFinite(residual) ? stepper.condition : Infinity;
    let outcome: PathOutcome;
    if (failure !== undefined) outcome = 'failed';
    else if (diverged) outcome = 'at-infinity';
    else if (winding !== 1 || !(condition <= base.singularCondition)) outcome = 'singular';
    else outcome = (homotopy.infinityDistance?.(x) ?? Infinity) <= INFINITY_ACCURACY_FACTOR * Math.max(1, condition) * 2 ** -52 ? 'at-infinity' : 'regular';
    const end: PathEnd = { outcome, point: x, residual, condition, windingNumber: winding, steps, rejectedSteps, retries };
    return failure === undefined ? end : { ...end, failure };
  }

  return { stepper, settings: base, track };
}
