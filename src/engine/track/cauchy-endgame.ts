import type { SegmentStatus, Stepper } from './stepper.ts';
import { distInf, normInf } from '../complex/packed.ts';

/**
 * An accepted estimate must satisfy ‖H(x̂, end)‖∞ / (1 + ‖x̂‖∞) ≤ this: a loop that also winds around a nearby
 * branch point averages several distinct ends into a stable but wrong value, which this test rejects.
 */
export const ENDPOINT_RESIDUAL = 1e-8;

/** Past this condition estimate of ∂H/∂x at a sample, moving closer to the end is pointless in double precision. */
const HOPELESS_CONDITION = 1e12;

/** Result of the endgame: status, estimated winding number, and whether the path was seen to diverge. */
export interface EndgameResult {
  status: SegmentStatus;
  winding: number;
  /** true when the distance to infinity fell steadily like s^w, w > 0 (then x is the last sample, not a limit). */
  diverged: boolean;
}

/**
 * Divergence test (in the spirit of Huber–Verschelde's valuations at infinity, SIAM J. Numer. Anal. 35, 1998):
 * the distance to infinity d is sampled at s_k = r0·ρ^k. A diverging path has d_k ≈ a·ρ^{k·w}, w > 0: the
 * valuation estimates w_k = log(d_k / d_{k−1}) / log ρ are steady and Aitken's Δ² extrapolation of d tends to 0.
 * A finite end has d_k ≈ d* + a·ρ^{k/c}: its w_k shrink by the factor ρ^{1/c} per sample (over three estimates,
 * by more than 16 % for winding numbers c ≤ 16) and Aitken recovers d* > 0. Diverging: d ≤ 0.02 and
 * decreasing, the last three w_k in [1/64, 64] within 10 % of each other, and the extrapolated limit below
 * a quarter of d. A finite end passes only if approached slowly while still far (a very ill-conditioned end,
 * or winding number above 16) with d* ≤ 0.005, coordinates ≥ 200× the chart's scale: the documented blind spot;
 * and before any verdict Newton at the end is tried from the sample (settle).
 */
const DIVERGING_DISTANCE = 0.02;
const LIMIT_FRACTION = 0.25;
const VALUATION_SPREAD = 1.1;

/**
 * The endgame around t = end, from x at t = end + r0·u (u a unit complex number pointing back along the path),
 * over radii r_k = r0·ρ^k (ρ = radiusRatio, at most 2·maxRounds radii), moving inward along the path's own
 * direction between radii. At every radius the divergence test runs. Until the operating zone is reached
 * (the ratios of successive differences, ρ^{1/c}, give estimates of c within 5 % three times in a row, as in
 * the power-series endgame) nothing else happens; then Cauchy loops (Morgan–Sommese–Wampler, Numer. Math. 63,
 * 1992): track t = end + r·u·e^{iθ} around the end, counting turns c until x returns to its start (relative
 * 1e-6; no closure within maxWinding turns gives no estimate at this radius); the end value is the mean of the
 * m·c equally spaced samples (trapezoid rule for Cauchy's integral formula in s^{1/c}). Accepted when two
 * successive estimates with the same c agree to endgameTolerance and the estimate's residual passes
 * ENDPOINT_RESIDUAL. The radii stop early where the condition estimate passes 1e12 or a step fails. Then the
 * last loop estimate, or else the last good sample after Newton at the end, is a singular end when its
 * residual is ≤ ENDPOINT_RESIDUAL (winding number: the last loop's, or 0 = undetermined); otherwise the path fails.
 * Before a divergence verdict and before that fallback, Newton at the end is tried from the sample (see settle). Writes the estimate (or, diverging, the last sample) into x.
 */
export function createCauchyEndgame(stepper: Stepper, infinityDistance?: (x: Float64Array) => number): (x: Float64Array, endRe: number, endIm: number, uRe: number, uIm: number, r0: number) => EndgameResult {
  const len = 2 * stepper.n;
  const start = new Float64Array(len), sum = new Float64Array(len), estimate = new Float64Array(len), previous = new Float64Array(len);
  const result: EndgameResult = { status: 'ok', winding: 1, diverged: false };
  const dd = new Float64Array(4), cc = new Float64Array(3);
  return (x, endRe, endIm, uRe, uIm, r0) => {
    const s = stepper.settings;
    let r = r0, havePrevious = false, lastWinding = 0, inZone = false, step = NaN;
    let stepStatus: SegmentStatus = 'ok';
    dd.fill(NaN);
    cc.fill(NaN);
    if (infinityDistance) dd[3] = infinityDistance(x);
    result.diverged = false;
    for (let k = 0; k < 2 * s.maxRounds; k++) {
      if (inZone) {
        const winding = loop(x, r);
        if (winding < 0) {
          x.set(start); // the loop's start: the last good sample
          break;
        }
        if (winding > 0) {
          if (havePrevious && winding === lastWinding && distInf(estimate, previous) <= s.endgameTolerance * (1 + normInf(estimate))
            && stepper.residual(estimate, endRe, endIm) <= ENDPOINT_RESIDUAL) {
            x.set(estimate);
            return done(winding, false);
          }
          previous.set(estimate);
        }
        havePrevious = winding > 0;
        lastWinding = winding;
      }
      start.set(x);
      const rNext = r * s.radiusRatio;
      stepStatus = stepper.segment(x, endRe + r * uRe, endIm + r * uIm, endRe + rNext * uRe, endIm + rNext * uIm);
      if (stepStatus !== 'ok') {
        x.set(start);
        break;
      }
      r = rNext;
      if (infinityDistance && diverging(infinityDistance(x))) return settle(x) ? done(1, false) : done(1, true);
      stepper.residual(x, endRe + r * uRe, endIm + r * uIm); // condition estimate at this sample
      if (stepper.condition > HOPELESS_CONDITION) break;
      if (!inZone) {
        const d = distInf(x, start);
        cc[0] = cc[1]!; cc[1] = cc[2]!; cc[2] = Math.log(s.radiusRatio) / Math.log(d / step);
        step = d;
        const lo = Math.min(cc[0]!, cc[1]!, cc[2]!), hi = Math.max(cc[0]!, cc[1]!, cc[2]!);
        inZone = (lo > 0.5 && hi <= 1.05 * lo) || d <= 1e-12 * (1 + normInf(x));
      }
    }
    // No settled estimate before the radii ran out, the condition passed 1e12, or a step failed close to the end:
    // the last loop estimate (else the last good sample, polished by Newton at the end) is accepted as a singular
    // end when its residual is at most ENDPOINT_RESIDUAL, with the last winding number (0: undetermined).
    // (A nonsingular end has winding number 1 by the implicit function theorem, whatever the loops said.)
    if (havePrevious && stepper.residual(previous, endRe, endIm) <= ENDPOINT_RESIDUAL) {
      x.set(previous);
      return done(stepper.condition <= s.singularCondition ? 1 : lastWinding, false);
    }
    if (settle(x)) return done(1, false);
    stepper.newton(x, endRe, endIm, s.finalTolerance, 8);
    if (stepper.residual(x, endRe, endIm) <= ENDPOINT_RESIDUAL) {
      if (stepper.condition <= s.singularCondition) return done(1, false);
      // singular and close to infinity, the distance still falling at the last samples: at infinity
      const last = infinityDistance ? infinityDistance(x) : Infinity;
      return done(0, last <= DIVERGING_DISTANCE && dd[3]! < dd[2]! && dd[2]! < dd[1]!);
    }
    return fail(stepStatus === 'ok' ? 'no-convergence' : stepStatus);

    /**
     * Newton at the end from x (a copy): when it converges to a point with condition ≤ singularCondition within
     * 1 % (relative) of x, that regular point is the path's end (an ill-conditioned end the approach and the loops
     * could not reach, seen before the divergence test misreads its slow approach): x moves there, true.
     */
    function settle(x: Float64Array): boolean {
      estimate.set(x);
      if (!stepper.newton(estimate, endRe, endIm, s.finalTolerance, 8) || !(stepper.condition <= s.singularCondition)) return false;
      if (distInf(estimate, x) > 1e-2 * (1 + normInf(x))) return false;
      x.set(estimate);
      return true;
    }

    /** Records the next distance to infinity and applies the divergence test. */
    function diverging(next: number): boolean {
      dd.copyWithin(0, 1);
      dd[3] = next;
      const logRho = Math.log(s.radiusRatio);
      const w1 = Math.log(dd[1]! / dd[0]!) / logRho, w2 = Math.log(dd[2]! / dd[1]!) / logRho, w3 = Math.log(dd[3]! / dd[2]!) / logRho;
      const lo = Math.min(w1, w2, w3), hi = Math.max(w1, w2, w3);
      const [e0, e1, e2] = [dd[1]!, dd[2]!, dd[3]!];
      const limit = e2 - ((e2 - e1) * (e2 - e1)) / (e2 - 2 * e1 + e0);
      return e2 <= DIVERGING_DISTANCE && lo >= 1 / 64 && hi <= 64 && hi <= VALUATION_SPREAD * lo && Math.abs(limit) <= LIMIT_FRACTION * e2;
    }

    /** One loop at radius r from x: the winding number (mean in `estimate`, x back at its start), 0 if not closed, −1 on a tracking failure. */
    function loop(x: Float64Array, r: number): number {
      const m = s.loopSamples;
      start.set(x);
      sum.fill(0);
      for (let turn = 1; turn <= s.maxWinding; turn++) {
        for (let k = 0; k < m; k++) {
          const a0 = (2 * Math.PI * k) / m, a1 = (2 * Math.PI * (k + 1)) / m;
          const c0 = Math.cos(a0), s0 = Math.sin(a0), c1 = Math.cos(a1), s1 = Math.sin(a1);
          const aRe = endRe + r * (uRe * c0 - uIm * s0), aIm = endIm + r * (uRe * s0 + uIm * c0);
          const bRe = endRe + r * (uRe * c1 - uIm * s1), bIm = endIm + r * (uRe * s1 + uIm * c1);
          stepStatus = stepper.segment(x, aRe, aIm, bRe, bIm);
          if (stepStatus !== 'ok') return -1;
          stepper.newton(x, bRe, bIm, s.finalTolerance, 3);
          for (let i = 0; i < len; i++) sum[i] = sum[i]! + x[i]!;
        }
        if (distInf(x, start) <= 1e-6 * (1 + normInf(x))) {
          for (let i = 0; i < len; i++) estimate[i] = sum[i]! / (m * turn);
          x.set(start); // back exactly to the start, so rounding drift does not accumulate
          return turn;
        }
      }
      x.set(start); // other branch points inside the circle: no estimate at this radius
      return 0;
    }
    function done(winding: number, diverged: boolean): EndgameResult {
      result.status = 'ok';
      result.winding = winding;
      result.diverged = diverged;
      return result;
    }
    function fail(status: SegmentStatus): EndgameResult {
      result.status = status;
      result.winding = lastWinding || 1;
      return result;
    }
  };

}
