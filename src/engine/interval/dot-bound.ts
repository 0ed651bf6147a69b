import { widenDown, widenUp } from './outward.ts';

const U2 = Number.EPSILON; // 2⁻⁵², twice the unit roundoff u = 2⁻⁵³
const TINY = Number.MIN_VALUE; // 2⁻¹⁰⁷⁴, the least subnormal: bounds the underflow error of one product (≤ TINY / 2)

/**
 * Encloses a dot product of exact doubles aₖ with intervals [cₖ − rₖ, cₖ + rₖ] (midpoint–radius form, Rump 1999),
 * from three sums the caller computes in plain round-to-nearest floating point over `count` products (each passing
 * through at most `count` roundings) and stores at sums[s], sums[s + 1], sums[s + 2]:
 * sum = Σ aₖcₖ, absSum = Σ |aₖ||cₖ|, radiusSum = Σ |aₖ|rₖ. (Read from an array, so no double is boxed in a call.) Bound (Higham, Accuracy and Stability, §3.1, with an
 * underflow term): |sum − Σaₖcₖ| ≤ γₙ·Σ|aₖcₖ| + n·TINY, and each computed sum of non-negative terms S̃ satisfies
 * S ≤ (S̃ + n·TINY)/(1 − γₙ), where γₙ = nu/(1 − nu) ≤ (n + 2)·2u = f for n·u ≤ 1/4, and 1/(1 − γₙ) ≤ 1 + f. The
 * radius R = f(absSum + nT) + nT + (1 + f)(radiusSum + nT) + … is itself formed with outward widening. Writes
 * [sum − R, sum + R] (widened) to out[o], out[o + 1]; NaN or ∞ inputs give a NaN or infinite (never a wrong) answer.
 */
export function dotEnclosure(count: number, sums: Float64Array, s: number, out: Float64Array, o: number): void {
  const sum = sums[s]!, absSum = sums[s + 1]!, radiusSum = sums[s + 2]!;
  const f = (count + 2) * U2;
  const slack = count * TINY;
  const rounding = widenUp(widenUp(f * widenUp(absSum + slack)) + slack);
  const spread = widenUp((1 + f) * widenUp(radiusSum + slack));
  const radius = widenUp(rounding + spread);
  out[o] = widenDown(sum - radius);
  out[o + 1] = widenUp(sum + radius);
}

/** Midpoint and radius of [lo, hi] with lo ≤ hi: out[o] = c (a double in [lo, hi]), out[o + 1] = r ≥ max(hi − c, c − lo). */
export function midRadius(lo: number, hi: number, out: Float64Array, o: number): void {
  const c = 0.5 * lo + 0.5 * hi;
  out[o] = c;
  out[o + 1] = widenUp(Math.max(hi - c, c - lo));
}
