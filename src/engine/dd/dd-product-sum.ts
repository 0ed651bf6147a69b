import { productError } from './error-free-product.ts';
import { sumError } from './error-free-sum.ts';

/**
 * x·y + z·w for normalised double-doubles (as in dd-add.ts) with one renormalisation instead of two products and
 * an add: the two high products are made exact (Dekker), their sum is split error-free (Knuth), and every smaller
 * term (both product errors, the sum's error, the four cross products) is added in double. Our derivation, to first
 * order in u = 2⁻⁵³, with S = |xh·yh| + |zh·wh|: the cross products round by ≤ 2u²S, their three sums by ≤ 4u²S,
 * the product errors' sum by ≤ u²S, adding the sum's error (≤ uS) by ≤ 2u²S, the last sum (≤ 4uS) by ≤ 4u²S, and
 * the dropped xl·yl + zl·wl is ≤ u²S: |error| ≤ 14u²·S. The bound is relative to S, not to the result (which may
 * cancel); two ddMul and a ddAdd give the same kind of bound at more cost. The closing two-sum is exact, so the
 * result is normalised. No overflow or underflow is assumed (|x·y|, |z·w| in [2⁻⁹⁶⁹, 2¹⁰²³), parts ≤ 2⁹⁹⁶).
 */

/** out[i..i+1] = x·y + z·w (x = xh + xl, …) with |error| ≤ 14u²(|x·y| + |z·w|) to first order (u = 2⁻⁵³). */
export function ddProductSum(xh: number, xl: number, yh: number, yl: number, zh: number, zl: number, wh: number, wl: number, out: Float64Array, i: number): void {
  const p1 = xh * yh, p2 = zh * wh;
  const s = p1 + p2;
  const small = sumError(p1, p2, s) + (productError(xh, yh, p1) + productError(zh, wh, p2));
  const cross = (xh * yl + xl * yh) + (zh * wl + zl * wh);
  const t = small + cross;
  const hi = s + t;
  out[i] = hi;
  out[i + 1] = sumError(s, t, hi);
}
