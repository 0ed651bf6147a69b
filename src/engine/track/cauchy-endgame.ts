import type { SegmentStatus, Stepper } from './stepper.ts';
import { distInf, normInf } from '../complex/packed.ts';

/**
 * An accepted estimate must satisfy ‖H(x̂, end)‖∞ / (1 + ‖x̂‖∞) ≤ this: a loop that also winds around a nearby
 * branch point averages several distinct ends into a stable but wrong value, which this test rejects.
 */
export const ENDPOINT_RESIDUAL = 1e-8;

/** Result of the Cauchy endgame: status, estimated winding number, and whether the estimates converged. */
export interface EndgameResult {
  status: SegmentStatus;
  winding: number;
}

/**
 * The Cauchy endgame (Morgan–Sommese–Wampler, Numer. Math. 63, 1992): from x at t = end + r·u (u a unit
 * complex number pointing back along the path) track loops t = end + r·u·e^{iθ} around the end, counting
 * turns c until x returns to its start (relative 1e-6): c is the winding number (a loop that does not close
 * within maxWinding turns gives no estimate and the radius shrinks). The end value is the mean
 * of the m·c equally spaced samples (trapezoid rule for Cauchy's integral formula in s^{1/c}), exact up to
 * O((r/R)^{m}). Radii shrink by `radiusRatio` until two estimates agree to `endgameTolerance` and the
 * estimate's residual passes ENDPOINT_RESIDUAL.
 * Writes the estimate into x. Uses the stepper's buffers only plus four vectors made once per call site.
 */
export function createCauchyEndgame(stepper: Stepper): (x: Float64Array, endRe: number, endIm: number, uRe: number, uIm: number, r0: number) => EndgameResult {
  const len = 2 * stepper.n;
  const start = new Float64Array(len), sum = new Float64Array(len), estimate = new Float64Array(len), previous = new Float64Array(len);
  const result: EndgameResult = { status: 'ok', winding: 1 };
  return (x, endRe, endIm, uRe, uIm, r0) => {
    const s = stepper.settings;
    const m = s.loopSamples;
    let r = r0, havePrevious = false, lastWinding = 0;
    // Operating zone (as in the power-series endgame): step in geometrically, s_k = r0·ρ^k, until the ratios of
    // successive differences, ρ^{1/c}, give the same estimate of c twice; loops start there.
    let d1 = NaN, c1 = NaN;
    for (let k = 0; k < s.maxRounds; k++) {
      for (let i = 0; i < len; i++) start[i] = x[i]!;
      const rNext = r * s.radiusRatio;
      const status = stepper.segment(x, endRe + r * uRe, endIm + r * uIm, endRe + rNext * uRe, endIm + rNext * uIm);
      if (status !== 'ok') return fail(status);
      r = rNext;
      const d = distInf(x, start);
      const c = Math.log(s.radiusRatio) / Math.log(d / d1);
      if (Math.abs(c - c1) < 0.1 * Math.max(1, c) || d <= 1e-12 * (1 + normInf(x))) break;
      d1 = d;
      c1 = c;
    }
    for (let round = 0; round < s.maxRounds; round++) {
      for (let i = 0; i < len; i++) { start[i] = x[i]!; sum[i] = 0; }
      let winding = 0;
      let closed = false;
      for (let turn = 1; turn <= s.maxWinding && !closed; turn++) {
        for (let k = 0; k < m; k++) {
          const a0 = (2 * Math.PI * k) / m, a1 = (2 * Math.PI * (k + 1)) / m;
          const c0 = Math.cos(a0), s0 = Math.sin(a0), c1 = Math.cos(a1), s1 = Math.sin(a1);
          const aRe = endRe + r * (uRe * c0 - uIm * s0), aIm = endIm + r * (uRe * s0 + uIm * c0);
          const bRe = endRe + r * (uRe * c1 - uIm * s1), bIm = endIm + r * (uRe * s1 + uIm * c1);
          const status = stepper.segment(x, aRe, aIm, bRe, bIm);
          if (status !== 'ok') return fail(status);
          stepper.newton(x, bRe, bIm, s.finalTolerance, 3);
          for (let i = 0; i < len; i++) sum[i] = sum[i]! + x[i]!;
        }
        winding = turn;
        closed = distInf(x, start) <= 1e-6 * (1 + normInf(x));
      }
      if (closed) {
        for (let i = 0; i < len; i++) estimate[i] = sum[i]! / (m * winding);
        // make the loop's end point exactly its start again, so rounding drift does not accumulate
        for (let i = 0; i < len; i++) x[i] = start[i]!;
        if (havePrevious && winding === lastWinding && distInf(estimate, previous) <= s.endgameTolerance * (1 + normInf(estimate))
          && stepper.residual(estimate, endRe, endIm) <= ENDPOINT_RESIDUAL) {
          for (let i = 0; i < len; i++) x[i] = estimate[i]!;
          result.status = 'ok';
          result.winding = winding;
          return result;
        }
        for (let i = 0; i < len; i++) previous[i] = estimate[i]!;
        havePrevious = true;
        lastWinding = winding;
      } else {
        // other branch points inside the circle: no estimate at this radius; move closer to the end
        for (let i = 0; i < len; i++) x[i] = start[i]!;
        havePrevious = false;
        lastWinding = 0;
      }
      const rNext = r * s.radiusRatio;
      const status = stepper.segment(x, endRe + r * uRe, endIm + r * uIm, endRe + rNext * uRe, endIm + rNext * uIm);
      if (status !== 'ok') return fail(status);
      r = rNext;
    }
    if (havePrevious) for (let i = 0; i < len; i++) x[i] = previous[i]!;
    return fail('no-convergence');

    function fail(status: SegmentStatus): EndgameResult {
      result.status = status;
      result.winding = lastWinding || 1;
      return result;
    }
  };
}
