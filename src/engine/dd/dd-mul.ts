import { productError } from './error-free-product.ts';

/**
 * Double-double products (operands and results normalised as in dd-add.ts, u = 2⁻⁵³, no overflow or underflow):
 * Dekker's product of the high parts made exact by splitting (no fused multiply-add in JavaScript), the cross
 * terms added in double, then renormalisation. Bounds of Joldes–Muller–Popescu (ACM TOMS 44(2), 2017),
 * Algorithms 10 and 7; test/engine/dd checks them against exact rationals.
 */

/** out[i..i+1] = (ah + al)·(bh + bl) with relative error ≤ 7u² (Dekker's product, then the cross terms; 24 flops). */
export function ddMul(ah: number, al: number, bh: number, bl: number, out: Float64Array, i: number): void {
  const p = ah * bh;
  const t = productError(ah, bh, p) + (ah * bl + al * bh);
  const zh = p + t;
  out[i] = zh;
  out[i + 1] = t - (zh - p);
}

/** out[i..i+1] = (ah + al)·b for a double b, with relative error ≤ 1.5u² + 4u³ (two renormalisations; 25 flops). */
export function ddMulDouble(ah: number, al: number, b: number, out: Float64Array, i: number): void {
  const p = ah * b;
  const c = al * b;
  const th = p + c, tl = c - (th - p);
  const t = tl + productError(ah, b, p);
  const zh = th + t;
  out[i] = zh;
  out[i + 1] = t - (zh - th);
}
