import { widenDown, widenUp } from '../interval/outward.ts';
import { dotEnclosure } from '../interval/dot-bound.ts';

/**
 * Allocation-free pieces of Krawczyk's operator. Accumulators are rectangles [reLo, reHi, imLo, imHi] held in
 * Float64Arrays (not doubles passed through calls), so nothing is boxed. Every rounded operation is widened outward;
 * NaN propagates (and makes the test fail).
 */

const E = Number.EPSILON; // 2⁻⁵²
const T = Number.MIN_VALUE; // 2⁻¹⁰⁷⁴
// Inline outward widening, x ± (E·|x| + T), the formula of outward.ts (proof there), written out so that no double
// crosses a function call (a non-inlined call would box it); an infinite bound may turn into NaN, which fails the test.

/** acc −= y·v for the exact complex y = (y[yo], y[yo + 1]) and a rectangle v at vo. */
export function subtractScaled(acc: Float64Array, y: Float64Array, yo: number, v: Float64Array, vo: number): void {
  const yr = y[yo]!, yi = y[yo + 1]!;
  const c0 = v[vo]!, c1 = v[vo + 1]!, d0 = v[vo + 2]!, d1 = v[vo + 3]!;
  // Re(y·v) = yr·C − yi·D, Im(y·v) = yr·D + yi·C, as [lo, hi] of each product (0·∞ = NaN: fails safe)
  let p = Math.min(yr * c0, yr * c1), q = Math.max(yi * d0, yi * d1);
  p -= E * Math.abs(p) + T; q += E * Math.abs(q) + T;
  let reLo = p - q; reLo -= E * Math.abs(reLo) + T;
  p = Math.max(yr * c0, yr * c1); q = Math.min(yi * d0, yi * d1);
  p += E * Math.abs(p) + T; q -= E * Math.abs(q) + T;
  let reHi = p - q; reHi += E * Math.abs(reHi) + T;
  p = Math.min(yr * d0, yr * d1); q = Math.min(yi * c0, yi * c1);
  p -= E * Math.abs(p) + T; q -= E * Math.abs(q) + T;
  let imLo = p + q; imLo -= E * Math.abs(imLo) + T;
  p = Math.max(yr * d0, yr * d1); q = Math.max(yi * c0, yi * c1);
  p += E * Math.abs(p) + T; q += E * Math.abs(q) + T;
  let imHi = p + q; imHi += E * Math.abs(imHi) + T;
  let r = acc[0]! - reHi; acc[0] = r - (E * Math.abs(r) + T);
  r = acc[1]! - reLo; acc[1] = r + (E * Math.abs(r) + T);
  r = acc[2]! - imHi; acc[2] = r - (E * Math.abs(r) + T);
  r = acc[3]! - imLo; acc[3] = r + (E * Math.abs(r) + T);
}

/** acc += m·v for rectangles m (4 doubles) and v at vo: 16 endpoint products (0·∞ = NaN: fails safe). */
export function addProduct(acc: Float64Array, m: Float64Array, v: Float64Array, vo: number): void {
  const a0 = m[0]!, a1 = m[1]!, b0 = m[2]!, b1 = m[3]!;
  const c0 = v[vo]!, c1 = v[vo + 1]!, d0 = v[vo + 2]!, d1 = v[vo + 3]!;
  const ac0 = a0 * c0, ac1 = a0 * c1, ac2 = a1 * c0, ac3 = a1 * c1;
  const bd0 = b0 * d0, bd1 = b0 * d1, bd2 = b1 * d0, bd3 = b1 * d1;
  const ad0 = a0 * d0, ad1 = a0 * d1, ad2 = a1 * d0, ad3 = a1 * d1;
  const bc0 = b0 * c0, bc1 = b0 * c1, bc2 = b1 * c0, bc3 = b1 * c1;
  // Re = A·C − B·D, Im = A·D + B·C
  let p = Math.min(ac0, ac1, ac2, ac3), q = Math.max(bd0, bd1, bd2, bd3);
  p -= E * Math.abs(p) + T; q += E * Math.abs(q) + T;
  let reLo = p - q; reLo -= E * Math.abs(reLo) + T;
  p = Math.max(ac0, ac1, ac2, ac3); q = Math.min(bd0, bd1, bd2, bd3);
  p += E * Math.abs(p) + T; q -= E * Math.abs(q) + T;
  let reHi = p - q; reHi += E * Math.abs(reHi) + T;
  p = Math.min(ad0, ad1, ad2, ad3); q = Math.min(bc0, bc1, bc2, bc3);
  p -= E * Math.abs(p) + T; q -= E * Math.abs(q) + T;
  let imLo = p + q; imLo -= E * Math.abs(imLo) + T;
  p = Math.max(ad0, ad1, ad2, ad3); q = Math.max(bc0, bc1, bc2, bc3);
  p += E * Math.abs(p) + T; q += E * Math.abs(q) + T;
  let imHi = p + q; imHi += E * Math.abs(imHi) + T;
  let r = acc[0]! + reLo; acc[0] = r - (E * Math.abs(r) + T);
  r = acc[1]! + reHi; acc[1] = r + (E * Math.abs(r) + T);
  r = acc[2]! + imLo; acc[2] = r - (E * Math.abs(r) + T);
  r = acc[3]! + imHi; acc[3] = r + (E * Math.abs(r) + T);
}

/**
 * out = δ_ij − Σ_k Y_ik·J_kj over the structurally non-zero rows k of column j (rows[start..end)), with J(X) given as
 * complex midpoints and real/imaginary radii; the sums are enclosed in midpoint–radius form (dot-bound.ts).
 * `scratch` holds at least 10 doubles.
 */
export function matrixEntry(
  out: Float64Array, i: number, j: number, n: number, inverse: Float64Array, centres: Float64Array, radii: Float64Array,
  rows: Int32Array, start: number, end: number, scratch: Float64Array,
): void {
  let sr = 0, si = 0, tr = 0, ti = 0, rr = 0, ri = 0;
  for (let q = start; q < end; q++) {
    const k = rows[q]!;
    const y = 2 * (i * n + k), c = 2 * (k * n + j);
    const yr = inverse[y]!, yi = inverse[y + 1]!, ayr = Math.abs(yr), ayi = Math.abs(yi);
    const cr = centres[c]!, ci = centres[c + 1]!, dr = radii[c]!, di = radii[c + 1]!;
    sr += yr * cr - yi * ci;
    si += yr * ci + yi * cr;
    tr += ayr * Math.abs(cr) + ayi * Math.abs(ci);
    ti += ayr * Math.abs(ci) + ayi * Math.abs(cr);
    rr += ayr * dr + ayi * di;
    ri += ayr * di + ayi * dr;
  }
  const terms = 2 * (end - start);
  scratch[4] = sr; scratch[5] = tr; scratch[6] = rr; scratch[7] = si; scratch[8] = ti; scratch[9] = ri;
  dotEnclosure(terms, scratch, 4, scratch, 0);
  dotEnclosure(terms, scratch, 7, scratch, 2);
  const delta = i === j ? 1 : 0;
  out[0] = widenDown(delta - scratch[1]!);
  out[1] = widenUp(delta - scratch[0]!);
  out[2] = -scratch[3]!;
  out[3] = -scratch[2]!;
}
