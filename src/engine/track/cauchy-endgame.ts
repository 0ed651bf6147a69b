import type { SegmentStatus, Stepper } from './stepper.ts';
import { distInf, normInf } from '../complex/packed.ts';

/** Result of the Cauchy endgame: status, estimated winding number, and whether the estimates converged. */
export interface EndgameResult {
  status: SegmentStatus;
  winding: number;
}

/**
 * The Cauchy endgame (Morgan–Sommese–Wampler, Numer. Math. 63, 1992): from x at t = end + r·u (u a unit
 * complex number pointing back along the path) track loops t = end + r·u·e^{iθ} around the end, counting
 * turns c until x returns to its start (relative 1e-6): c is the winding number. The end value is the mean
 * of the m·c equally spaced samples (trapezoid rule for Cauchy's integral formula in s^{1/c}), exact up to
 * O((r/R)^{m}). Radii shrink by `radiusRatio` until two estimates agree to `endgameTolerance`.
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
      if (!closed) return fail('no-convergence');
      for (let i = 0; i < len; i++) estimate[i] = sum[i]! / (m * winding);
      // make the loop's end point exactly its start again, so rounding drift does not accumulate
      for (let i = 0; i < len; i++) x[i] = start[i]!;
      if (havePrevious && winding === lastWinding && distInf(estimate, previous) <= s.endgameTolerance * (1 + normInf(estimate))) {
        for (let i = 0; i < len; i++) x[i] = estimate[i]!;
        result.status = 'ok';
        result.winding = winding;
        return result;
      }
      for (let i = 0; i < len; i++) previous[i] = estimate[i]!;
      havePrevious = true;
      lastWinding = winding;
      const rNext = r * s.radiusRatio;
      const status = stepper.segment(x, endRe + r * uRe, endIm + r * uIm, endRe + rNext * uRe, endIm + rNext * uIm);
      if (status !== 'ok') return fail(status);
      r = rNext;
    }
    for (let i = 0; i < len; i++) x[i] = previous[i]!;
    return fail('no-convergence');

    function fail(status: SegmentStatus): EndgameResult {
      result.status = status;
      result.winding = lastWinding || 1;
      return result;
    }
  };
}
