import { ddAdd } from './dd-add.ts';
import { productError } from './error-free-product.ts';
import { sumError } from './error-free-sum.ts';

/**
 * Vector kernels for a double-double state: a packed complex vector of n entries held as two Float64Arrays hi and
 * lo (length 2n, re/im interleaved), entry j standing for hi[j] + lo[j], normalised (|lo[j]| ≤ ulp(hi[j])/2).
 * Every real entry is handled on its own; bounds are per real entry, u = 2⁻⁵³, no overflow or underflow assumed.
 * Nothing is allocated (one module scratch pair).
 */

const pair = new Float64Array(2);

/** hi, lo ← (hi + lo) − dx for a packed double dx, each entry with relative error ≤ 2u² (Joldes–Muller–Popescu 2017, Alg. 4). */
export function subtractFromDd(hi: Float64Array, lo: Float64Array, dx: Float64Array, n = hi.length >> 1): void {
  for (let j = 0; j < 2 * n; j++) {
    const h = hi[j]!, d = -dx[j]!;
    const sh = h + d;
    const v = lo[j]! + sumError(h, d, sh);
    const zh = sh + v;
    hi[j] = zh;
    lo[j] = v - (zh - sh);
  }
}

/** hi, lo ← (hi + lo) + c·k for a double c and packed double k: c·k exact (Dekker), then the accurate add (≤ 3u² + 13u³ relative). */
export function addScaledToDd(hi: Float64Array, lo: Float64Array, c: number, k: Float64Array, n = hi.length >> 1): void {
  for (let j = 0; j < 2 * n; j++) {
    const p = c * k[j]!;
    ddAdd(hi[j]!, lo[j]!, p, productError(c, k[j]!, p), pair, 0);
    hi[j] = pair[0]!;
    lo[j] = pair[1]!;
  }
}

/** out[j] = RN(hi[j] + lo[j]), the double nearest each entry (out may alias hi). */
export function roundDdToDouble(out: Float64Array, hi: Float64Array, lo: Float64Array, n = hi.length >> 1): void {
  for (let j = 0; j < 2 * n; j++) out[j] = hi[j]! + lo[j]!;
}

/** max over complex entries of |RN(hi + lo)|, as a double (relative error ≤ 2u, like packed.ts normInf; NaN propagates). */
export function ddNormInf(hi: Float64Array, lo: Float64Array, n = hi.length >> 1): number {
  let m = 0;
  for (let j = 0; j < 2 * n; j += 2) {
    const re = hi[j]! + lo[j]!, im = hi[j + 1]! + lo[j + 1]!;
    const s = re * re + im * im;
    if (s > m || s !== s) m = s;
  }
  return Math.sqrt(m);
}
