import { widenDown, widenUp } from './outward.ts';

/**
 * Outward-rounded endpoint formulas: each correctly rounded (round-to-nearest) result is moved at least one float
 * outward, so the exact real result lies inside [lower, upper] whatever the rounding mode. NaN in means NaN out
 * (callers treat NaN as "no enclosure"); products follow the interval convention 0 · ∞ = 0.
 */

/** The product of two endpoints with 0 · (±∞) = 0; NaN only when an input is NaN. */
export function endProduct(x: number, y: number): number {
  const p = x * y;
  if (p === p) return p;
  return x !== x || y !== y ? NaN : 0;
}

/** A lower bound of min over the four endpoint products of [a0, a1]·[b0, b1]. */
export function mulLo(a0: number, a1: number, b0: number, b1: number): number {
  return widenDown(Math.min(endProduct(a0, b0), endProduct(a0, b1), endProduct(a1, b0), endProduct(a1, b1)));
}

/** An upper bound of max over the four endpoint products of [a0, a1]·[b0, b1]. */
export function mulHi(a0: number, a1: number, b0: number, b1: number): number {
  return widenUp(Math.max(endProduct(a0, b0), endProduct(a0, b1), endProduct(a1, b0), endProduct(a1, b1)));
}

/** A lower bound of c·[b0, b1] for an exact double c. */
export function scaleLo(c: number, b0: number, b1: number): number {
  return widenDown(c >= 0 ? endProduct(c, b0) : endProduct(c, b1));
}

/** An upper bound of c·[b0, b1] for an exact double c. */
export function scaleHi(c: number, b0: number, b1: number): number {
  return widenUp(c >= 0 ? endProduct(c, b1) : endProduct(c, b0));
}

/** A lower bound of {x² : x ∈ [a0, a1]} (0 when the interval contains 0). */
export function sqrLo(a0: number, a1: number): number {
  if (a0 !== a0 || a1 !== a1) return NaN;
  if (a0 >= 0) return Math.max(0, widenDown(a0 * a0));
  if (a1 <= 0) return Math.max(0, widenDown(a1 * a1));
  return 0;
}

/** An upper bound of {x² : x ∈ [a0, a1]}. */
export function sqrHi(a0: number, a1: number): number {
  return widenUp(Math.max(a0 * a0, a1 * a1));
}
