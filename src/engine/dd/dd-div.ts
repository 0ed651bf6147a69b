import { ddMulDouble } from './dd-mul.ts';

/**
 * Double-double quotient (operands and result normalised as in dd-add.ts, u = 2⁻⁵³, no overflow or underflow):
 * the double quotient q of the high parts, the back-product q·b as a double-double (ddMulDouble), and one
 * correction term (Joldes–Muller–Popescu, ACM TOMS 44(2), 2017, Algorithm 17, after Dekker 1971).
 */

const backProduct = new Float64Array(2);

/** out[i..i+1] = (ah + al)/(bh + bl) with relative error ≤ 15u² + 56u³; bh = 0 gives ±∞ or NaN like a double division. */
export function ddDiv(ah: number, al: number, bh: number, bl: number, out: Float64Array, i: number): void {
  const q = ah / bh;
  ddMulDouble(bh, bl, q, backProduct, 0);
  // the remainder a − q·b: ah − rh is exact (Sterbenz: rh is within a factor 2 of ah), the rest is rounded
  const correction = ((ah - backProduct[0]!) + (al - backProduct[1]!)) / bh;
  const zh = q + correction;
  out[i] = zh;
  out[i + 1] = correction - (zh - q);
}
