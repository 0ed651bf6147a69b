/**
 * Error-free transformation of a product without a fused multiply-add (JavaScript has none): Veltkamp's splitting
 * and Dekker's product (T. J. Dekker, A floating-point technique for extending the available precision, Numer. Math.
 * 18, 1971). split(a) = (h, l) with a = h + l exactly and h, l each of at most 26 significant bits, so the four
 * partial products h·h′, h·l′, l·h′, l·l′ are exact doubles; twoProd adds them to the error of RN(a·b) in an order
 * that keeps every step exact.
 *
 * Overflow caveat: the split computes (2²⁷ + 1)·a, which overflows once |a| exceeds MAX_VALUE/(2²⁷ + 1) ≈ 1.3e300;
 * there the pieces are NaN or ±∞. We promise |a| ≤ 2⁹⁹⁶ (≈ 6.7e299). twoProd is exact when a and b stay inside that
 * range, |a·b| < 2¹⁰²³ and |a·b| ≥ 2⁻⁹⁶⁹ (the error term, of size ≤ 2⁻⁵³·|a·b|, must not fall among the subnormals);
 * outside, p = RN(a·b) still holds but the error is approximate (or NaN on overflow).
 */

/** Veltkamp's splitting constant 2²⁷ + 1 for binary64 (53 = 26 + 27 bits). */
export const SPLIT_FACTOR = 134217729;

/** out[i], out[i + 1] = h, l with a = h + l exactly and h, l of ≤ 26 significant bits each; valid for |a| ≤ 2⁹⁹⁶. */
export function split(a: number, out: Float64Array, i: number): void {
  const t = SPLIT_FACTOR * a;
  const h = t - (t - a);
  out[i] = h;
  out[i + 1] = a - h;
}

/** The exact error a·b − p of p = RN(a·b) (Dekker), under the range conditions of twoProd (16 flops). */
export function productError(a: number, b: number, p: number): number {
  const ta = SPLIT_FACTOR * a, tb = SPLIT_FACTOR * b;
  const ah = ta - (ta - a), bh = tb - (tb - b);
  const al = a - ah, bl = b - bh;
  return (((ah * bh - p) + ah * bl) + al * bh) + al * bl;
}

/** out[i], out[i + 1] = p, e with p = RN(a·b) and a·b = p + e exactly, for |a|, |b| ≤ 2⁹⁹⁶, |a·b| in [2⁻⁹⁶⁹, 2¹⁰²³) (17 flops). */
export function twoProd(a: number, b: number, out: Float64Array, i: number): void {
  const p = a * b;
  out[i] = p;
  out[i + 1] = productError(a, b, p);
}
