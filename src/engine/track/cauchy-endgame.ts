import type { SegmentStatus, Stepper } from './stepper.ts';
import { distInf, normInf } from '../complex/packed.ts';
import type { Homotopy } from '../homotopy.ts';

/** The distances to infinity the endgame watches: `groups` of them, group g's by distance(x, g). */
export interface InfinityProbe {
  readonly groups: number;
  distance(x: Float64Array, group: number): number;
}

/** The homotopy's distances to infinity per projective group (one group when it reports only the minimum); none without. */
export function infinityProbe(homotopy: Homotopy): InfinityProbe | undefined {
  if (homotopy.groupInfinityDistance && homotopy.infinityGroups) {
    const f = homotopy.groupInfinityDistance.bind(homotopy);
    return { groups: homotopy.infinityGroups, distance: f };
  }
  if (homotopy.infinityDistance) {
    const f = homotopy.infinityDistance.bind(homotopy);
    return { groups: 1, distance: (x) => f(x) };
  }
  return undefined;
}

/**
 * An accepted estimate must satisfy ‖H(x̂, end)‖∞ / (1 + ‖x̂‖∞) ≤ this: a loop that also winds around a nearby
 * branch point averages several distinct ends into a stable but wrong value, which this test rejects.
 */
export const ENDPOINT_RESIDUAL = 1e-8;

/**
 * Past this condition estimate of ∂H/∂x at a sample, moving closer to the end is pointless: in double precision
 * Newton cannot correct a sample to better than κ·2⁻⁵³; with double-double residuals (TrackerSettings.precision) the
 * corrections stay accurate until the LU factorisation of ∂H/∂x itself loses its last digits.
 */
const HOPELESS_CONDITION = { double: 1e12, 'double-double': 1e15 } as const;

/** Result of the endgame: status, estimated winding number, and whether the path was seen to diverge. */
export interface EndgameResult {
  status: SegmentStatus;
  winding: number;
  /**
   * true when the end is at infinity: the distance to infinity fell steadily like s^w, w > 0 (x is then the last
   * sample), or the loops' limit lies at infinity within its accuracy (x is the limit).
   */
  diverged: boolean;
  /**
   * true when a loop estimate with winding number above 1 was accepted without its inward check (the samples inward
   * passed the hopeless condition first): then `sample` holds the path's point at radius `sampleRadius` on the
   * endgame's ray, from which a re-track in extended precision can check it.
   */
  provisional: boolean;
  readonly sample: Float64Array;
  sampleRadius: number;
}

/**
 * Divergence test (in the spirit of Huber–Verschelde's valuations at infinity, SIAM J. Numer. Anal. 35, 1998):
 * the distance to infinity d is sampled at s_k = r0·ρ^k. A diverging path has d_k ≈ a·ρ^{k·w}, w > 0: the
 * valuation estimates w_k = log(d_k / d_{k−1}) / log ρ are steady and Aitken's Δ² extrapolation of d tends to 0.
 * With several projective groups the test runs on each group's distance: one group diverging suffices.
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
 * ENDPOINT_RESIDUAL and, for c > 1, confirmed by the path inward (confirmedInward). The radii stop early where the condition estimate passes 1e12 or a step fails. Then the
 * last loop estimate, or else the last good sample after Newton at the end, is a singular end when its
 * residual is ≤ ENDPOINT_RESIDUAL (winding number: the last loop's, or 0 = undetermined); otherwise the path fails.
 * Before a divergence verdict and before that fallback, Newton at the end is tried from the sample (see settle). Writes the estimate (or, diverging, the last sample) into x.
 */
export function createCauchyEndgame(stepper: Stepper, probe?: InfinityProbe): (x: Float64Array, endRe: number, endIm: number, uRe: number, uIm: number, r0: number) => EndgameResult {
  const len = 2 * stepper.n;
  const start = new Float64Array(len), sum = new Float64Array(len), estimate = new Float64Array(len), previous = new Float64Array(len), inward = new Float64Array(len);
  const result: EndgameResult = { status: 'ok', winding: 1, diverged: false, provisional: false, sample: new Float64Array(len), sampleRadius: 0 };
  const groups = probe?.groups ?? 0;
  // per group g: the last four distances to infinity at dd[4g … 4g + 3], and the distance where the endgame began
  const dd = new Float64Array(4 * groups), dStart = new Float64Array(groups), cc = new Float64Array(3);
  const infinityDistance = probe && ((x: Float64Array): number => {
    let d = Infinity;
    for (let g = 0; g < groups; g++) d = Math.min(d, probe.distance(x, g));
    return d;
  });
  return (x, endRe, endIm, uRe, uIm, r0) => {
    const s = stepper.settings;
    let r = r0, havePrevious = false, lastWinding = 0, inZone = false, step = NaN, agreement = Infinity, confirmRadius = r0;
    let stepStatus: SegmentStatus = 'ok';
    dd.fill(NaN);
    cc.fill(NaN);
    for (let g = 0; g < groups; g++) dd[4 * g + 3] = dStart[g] = probe!.distance(x, g);
    result.diverged = false;
    result.provisional = false;
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
            const check = winding > 1 ? confirmedInward(x, r, winding) : 'confirmed';
            if (check === 'rejected') {
              // the samples inward left the estimate behind: the loops enclosed a second branch point near the end;
              // go on from the sample reached, inside it
              r = confirmRadius;
              havePrevious = false;
              lastWinding = 0;
              continue;
            }
            // in double precision the inward check reaches only radii of about 1e-13: a second branch point closer to the
            // end than that goes unseen, so every estimate with c > 1 stays provisional until checked in extended precision
            const provisional = check === 'unchecked' || (winding > 1 && s.precision !== 'double-double');
            if (provisional) {
              result.sample.set(x);
              result.sampleRadius = r;
            }
            result.provisional = provisional;
            x.set(estimate);
            // at infinity when the limit is, to within its accuracy, or when the samples' distances to infinity were
            // still falling steadily toward 0 (the loops' mean then carries the truncation of a diverging expansion)
            return done(winding, atInfinity(x, Math.max(agreement, s.finalTolerance)) || (probe !== undefined && steadyDecay(false)));
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
      if (probe && diverging(x, true)) return settle(x) ? done(1, false) : done(1, true);
      stepper.residual(x, endRe + r * uRe, endIm + r * uIm); // condition estimate at this sample
      if (stepper.condition > HOPELESS_CONDITION[s.precision ?? 'double']) break;
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
    // The distance to infinity still falling steadily at the last samples is evidence enough of divergence, unless
    // Newton at the end finds a nonsingular end there (settle); it outweighs a loop estimate that never agreed.
    if (settle(x)) return done(1, false);
    if (probe && (steadyDecay(false) || collapsed())) return done(lastWinding || 1, true);
    if (havePrevious && stepper.residual(previous, endRe, endIm) <= ENDPOINT_RESIDUAL) {
      // an estimate no second loop agreed with: provisional, resting on the last good sample
      result.sample.set(x);
      result.sampleRadius = r;
      result.provisional = true;
      x.set(previous);
      return done(stepper.condition <= s.singularCondition ? 1 : lastWinding, false);
    }
    stepper.newton(x, endRe, endIm, s.finalTolerance, 8);
    if (stepper.residual(x, endRe, endIm) <= ENDPOINT_RESIDUAL) return done(stepper.condition <= s.singularCondition ? 1 : 0, false);
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

    /** Records the next distances to infinity (every group) and applies the divergence test (with the drop since the start). */
    function diverging(x: Float64Array, needDrop: boolean): boolean {
      for (let g = 0; g < groups; g++) {
        dd.copyWithin(4 * g, 4 * g + 1, 4 * g + 4);
        dd[4 * g + 3] = probe!.distance(x, g);
      }
      return steadyDecay(needDrop);
    }

    /** Some group's last four distances to infinity decay steadily toward 0 (see the divergence test). */
    function steadyDecay(needDrop: boolean): boolean {
      const logRho = Math.log(s.radiusRatio);
      for (let g = 0; g < groups; g++) {
        const d0 = dd[4 * g]!, d1 = dd[4 * g + 1]!, d2 = dd[4 * g + 2]!, d3 = dd[4 * g + 3]!;
        const w1 = Math.log(d1 / d0) / logRho, w2 = Math.log(d2 / d1) / logRho, w3 = Math.log(d3 / d2) / logRho;
        const lo = Math.min(w1, w2, w3), hi = Math.max(w1, w2, w3);
        const limit = d3 - ((d3 - d2) * (d3 - d2)) / (d3 - 2 * d2 + d1);
        if ((!needDrop || d3 <= DIVERGENCE_DROP * dStart[g]!) && lo >= 1 / 64 && hi <= 64 && hi <= VALUATION_SPREAD * lo && Math.abs(limit) <= LIMIT_FRACTION * d3) return true;
      }
      return false;
    }

    /**
     * Checks a loop estimate with winding number c > 1 against the path itself: tracked inward from the loop's start
     * x at radius r down to the endgame's smallest radius, the sample's distance to the estimate must shrink at least like
     * (s/r)^{1/c} (within a factor 4). Loops that enclose a second branch point near the end average the ends of
     * two different paths into a stable estimate that solves F wherever F is small (near an excess set); inward of
     * that branch point the path leaves the estimate at a fixed distance. On a mismatch, x moves to the sample
     * reached and confirmRadius to its radius ('rejected'); 'confirmed' at the smallest radius; 'unchecked' when the
     * inward samples fail or pass the hopeless condition first (nothing closer to compare with in this precision).
     */
    function confirmedInward(x: Float64Array, r: number, c: number): 'confirmed' | 'rejected' | 'unchecked' {
      const floor = s.endgameTolerance * (1 + normInf(estimate));
      const smallest = r0 * Math.pow(s.radiusRatio, 2 * s.maxRounds);
      const d0 = distInf(x, estimate);
      inward.set(x);
      let rr = r;
      for (let j = 1; rr * s.radiusRatio >= smallest; j++) {
        const rNext = rr * s.radiusRatio;
        if (stepper.segment(inward, endRe + rr * uRe, endIm + rr * uIm, endRe + rNext * uRe, endIm + rNext * uIm) !== 'ok') return 'unchecked';
        rr = rNext;
        stepper.residual(inward, endRe + rr * uRe, endIm + rr * uIm);
        if (stepper.condition > HOPELESS_CONDITION[s.precision ?? 'double']) return 'unchecked';
        if (distInf(inward, estimate) > 4 * d0 * Math.pow(s.radiusRatio, j / c) + floor) {
          x.set(inward);
          confirmRadius = rr;
          return 'rejected';
        }
      }
      return 'confirmed';
    }

    /**
     * Some group's distance to infinity fell by at least DIVERGENCE_DROP since the endgame began and by a factor of at
     * least 1/ρ (valuation ≥ 1) at each of the last three samples: evidence of divergence even where the valuations
     * never steadied (several scales at once). A finite end slows its approach as the distance nears its limit.
     */
    function collapsed(): boolean {
      for (let g = 0; g < groups; g++) {
        const d0 = dd[4 * g]!, d1 = dd[4 * g + 1]!, d2 = dd[4 * g + 2]!, d3 = dd[4 * g + 3]!;
        const rho = s.radiusRatio;
        if (d3 <= DIVERGENCE_DROP * dStart[g]! && d1 <= rho * d0 && d2 <= rho * d1 && d3 <= rho * d2) return true;
      }
      return false;
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
