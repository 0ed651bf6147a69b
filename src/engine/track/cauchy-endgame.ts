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
  /**
   * true when the end is at infinity: the distance to infinity fell steadily like s^w, w > 0 (x is then the last
   * sample), or the loops' limit lies at infinity within its accuracy (x is the limit).
   */
  diverged: boolean;
}

/**
 * Divergence test (in the spirit of Huber–Verschelde's valuations at infinity, SIAM J. Numer. Anal. 35, 1998):
 * the distance to infinity d is sampled at s_k = r0·ρ^k. A diverging path has d_k ≈ a·ρ^{k·w}, w > 0: the
 * valuation estimates w_k = log(d_k / d_{k−1}) / log ρ are steady and Aitken's Δ² extrapolation of d tends to 0.
 * A finite end has d_k ≈ d* + a·ρ^{k/c}: its w_k shrink toward 0 and Aitken recovers d* > 0 once d_k nears d*.
 * The verdict needs evidence, never a fixed distance: the last three w_k in [1/64, 64] within 10 % of each other,
 * the extrapolated limit below a quarter of d, and d fallen by at least DIVERGENCE_DROP since the endgame began
 * (so a far finite end would have to sit 10⁴ times closer to infinity than where the endgame found the path);
 * before any verdict Newton at the end is tried from the sample (settle), which keeps every nonsingular end however
 * far out. Loop estimates (Cauchy) are at infinity when their distance to infinity is within ten times their own
 * accuracy (the distance between the two agreeing estimates, and no better than finalTolerance: the samples are
 * corrected to that).
 */
const DIVERGENCE_DROP = 1e-4;
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
    let r = r0, havePrevious = false, lastWinding = 0, inZone = false, step = NaN, agreement = Infinity;
    let stepStatus: SegmentStatus = 'ok';
    dd.fill(NaN);
    cc.fill(NaN);
    if (infinityDistance) dd[3] = infinityDistance(x);
    const dStart = dd[3]!;
    result.diverged = false;
    for (let k = 0; k < 2 * s.maxRounds; k++) {
      if (inZone) {
        const winding = loop(x, r);
        if (winding < 0) {
          x.set(start); // the loop's start: the last good sample
          break;
        }
        if (winding > 0) {
          if (havePrevious && winding === lastWinding && (agreement = distInf(estimate, previous) / (1 + normInf(estimate))) <= s.endgameTolerance
            && stepper.residual(estimate, endRe, endIm) <= ENDPOINT_RESIDUAL) {
            x.set(estimate);
            return done(winding, atInfinity(x, Math.max(agreement, s.finalTolerance)));
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
      if (infinityDistance && diverging(infinityDistance(x), true)) return settle(x) ? done(1, false) : done(1, true);
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
    // The distance to infinity still falling steadily at the last samples is evidence enough of divergence.
    const fallingAtEnd = infinityDistance !== undefined && steadyDecay(false);
    if (havePrevious && stepper.residual(previous, endRe, endIm) <= ENDPOINT_RESIDUAL) {
      x.set(previous);
      const nonsingular = stepper.condition <= s.singularCondition;
      return done(nonsingular ? 1 : lastWinding, !nonsingular && fallingAtEnd);
    }
    if (settle(x)) return done(1, false);
    stepper.newton(x, endRe, endIm, s.finalTolerance, 8);
    if (stepper.residual(x, endRe, endIm) <= ENDPOINT_RESIDUAL) {
      if (stepper.condition <= s.singularCondition) return done(1, false);
      return done(0, fallingAtEnd);
    }
    if (fallingAtEnd) return done(1, true);
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

    /** Records the next distance to infinity and applies the divergence test (with the drop since the start). */
    function diverging(next: number, needDrop: boolean): boolean {
      dd.copyWithin(0, 1);
      dd[3] = next;
      return steadyDecay(needDrop);
    }

    /** The last four distances to infinity decay steadily toward 0 (see the divergence test). */
    function steadyDecay(needDrop: boolean): boolean {
      const logRho = Math.log(s.radiusRatio);
      const w1 = Math.log(dd[1]! / dd[0]!) / logRho, w2 = Math.log(dd[2]! / dd[1]!) / logRho, w3 = Math.log(dd[3]! / dd[2]!) / logRho;
      const lo = Math.min(w1, w2, w3), hi = Math.max(w1, w2, w3);
      const [e0, e1, e2] = [dd[1]!, dd[2]!, dd[3]!];
      const limit = e2 - ((e2 - e1) * (e2 - e1)) / (e2 - 2 * e1 + e0);
      return (!needDrop || e2 <= DIVERGENCE_DROP * dStart) && lo >= 1 / 64 && hi <= 64 && hi <= VALUATION_SPREAD * lo && Math.abs(limit) <= LIMIT_FRACTION * e2;
    }

    /** A limit estimate known to relative accuracy `accuracy` is at infinity when its distance to infinity is within ten times that. */
    function atInfinity(x: Float64Array, accuracy: number): boolean {
      return infinityDistance !== undefined && infinityDistance(x) <= 10 * Math.max(accuracy, 2 ** -52);
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
