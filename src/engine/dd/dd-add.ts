import { sumError } from './error-free-sum.ts';

/**
 * Double-double sums. A double-double (hi, lo) stands for the exact sum hi + lo and is normalised when
 * hi = RN(hi + lo), i.e. |lo| ≤ ulp(hi)/2; every kernel here takes normalised operands and returns a normalised
 * pair in out[i] (hi), out[i + 1] (lo). u = 2⁻⁵³; no overflow or underflow is assumed. The algorithms are Dekker's
 * (1971) and Hida–Li–Bailey's (ARITH-15, 2001, the "IEEE-style" add); the relative error bounds are those of
 * M. Joldes, J.-M. Muller, V. Popescu, Tight and rigorous error bounds for basic building blocks of double-word
 * arithmetic, ACM TOMS 44(2), 2017 (Algorithms 4 and 6), which test/engine/dd checks against exact rationals.
 */

/** out[i..i+1] = (ah + al) + (bh + bl) with relative error ≤ 3u² + 13u³ (accurate add; 20 flops). */
export function ddAdd(ah: number, al: number, bh: number, bl: number, out: Float64Array, i: number): void {
  // two error-free sums of the high and the low parts, then two fast renormalisations
  const sh = ah + bh, th = al + bl;
  const tl = sumError(al, bl, th);
  const c = sumError(ah, bh, sh) + th;
  const vh = sh + c, vl = c - (vh - sh);
  const w = tl + vl;
  const zh = vh + w;
  out[i] = zh;
  out[i + 1] = w - (zh - vh);
}

/** out[i..i+1] = (ah + al) + b for a double b, with relative error ≤ 2u² (10 flops). */
export function ddAddDouble(ah: number, al: number, b: number, out: Float64Array, i: number): void {
  const sh = ah + b;
  const v = al + sumError(ah, b, sh);
  const zh = sh + v;
  out[i] = zh;
  out[i + 1] = v - (zh - sh);
}
