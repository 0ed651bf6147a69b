import { widenDown, widenUp } from './outward.ts';
import { mulHi, mulLo, scaleHi, scaleLo, sqrHi, sqrLo } from './bounds.ts';

/**
 * Complex interval arithmetic on rectangles [reLo, reHi, imLo, imHi] stored in Float64Arrays (4 doubles per
 * value): op(out, o, a, ia, b, ib) writes a rectangle enclosing {z op w : z ∈ a, w ∈ b}. Built from the
 * outward-rounded real endpoint formulas, so enclosures hold without rounding-mode control. Rectangles are not
 * closed under multiplication: the product rectangle over-approximates (never under-approximates) the true set.
 */

/** a + b. */
export function complexAdd(out: Float64Array, o: number, a: Float64Array, ia: number, b: Float64Array, ib: number): void {
  out[o] = widenDown(a[ia]! + b[ib]!);
  out[o + 1] = widenUp(a[ia + 1]! + b[ib + 1]!);
  out[o + 2] = widenDown(a[ia + 2]! + b[ib + 2]!);
  out[o + 3] = widenUp(a[ia + 3]! + b[ib + 3]!);
}

/** a − b. */
export function complexSub(out: Float64Array, o: number, a: Float64Array, ia: number, b: Float64Array, ib: number): void {
  out[o] = widenDown(a[ia]! - b[ib + 1]!);
  out[o + 1] = widenUp(a[ia + 1]! - b[ib]!);
  out[o + 2] = widenDown(a[ia + 2]! - b[ib + 3]!);
  out[o + 3] = widenUp(a[ia + 3]! - b[ib + 2]!);
}

/** −a (exact). */
export function complexNeg(out: Float64Array, o: number, a: Float64Array, ia: number): void {
  const r0 = a[ia]!, r1 = a[ia + 1]!, i0 = a[ia + 2]!, i1 = a[ia + 3]!;
  out[o] = -r1;
  out[o + 1] = -r0;
  out[o + 2] = -i1;
  out[o + 3] = -i0;
}

/** a · b: real part A·C − B·D, imaginary part A·D + B·C, each term outward rounded. */
export function complexMul(out: Float64Array, o: number, a: Float64Array, ia: number, b: Float64Array, ib: number): void {
  const a0 = a[ia]!, a1 = a[ia + 1]!, b0 = a[ia + 2]!, b1 = a[ia + 3]!;
  const c0 = b[ib]!, c1 = b[ib + 1]!, d0 = b[ib + 2]!, d1 = b[ib + 3]!;
  // fast path: the 16 endpoint products once each; any NaN (0·∞ or NaN input) takes the careful path below
  const ac0 = a0 * c0, ac1 = a0 * c1, ac2 = a1 * c0, ac3 = a1 * c1;
  const bd0 = b0 * d0, bd1 = b0 * d1, bd2 = b1 * d0, bd3 = b1 * d1;
  const ad0 = a0 * d0, ad1 = a0 * d1, ad2 = a1 * d0, ad3 = a1 * d1;
  const bc0 = b0 * c0, bc1 = b0 * c1, bc2 = b1 * c0, bc3 = b1 * c1;
  const check = ac0 + ac1 + ac2 + ac3 + bd0 + bd1 + bd2 + bd3 + ad0 + ad1 + ad2 + ad3 + bc0 + bc1 + bc2 + bc3;
  if (check - check === 0) {
    out[o] = widenDown(widenDown(Math.min(ac0, ac1, ac2, ac3)) - widenUp(Math.max(bd0, bd1, bd2, bd3)));
    out[o + 1] = widenUp(widenUp(Math.max(ac0, ac1, ac2, ac3)) - widenDown(Math.min(bd0, bd1, bd2, bd3)));
    out[o + 2] = widenDown(widenDown(Math.min(ad0, ad1, ad2, ad3)) + widenDown(Math.min(bc0, bc1, bc2, bc3)));
    out[o + 3] = widenUp(widenUp(Math.max(ad0, ad1, ad2, ad3)) + widenUp(Math.max(bc0, bc1, bc2, bc3)));
    return;
  }
  out[o] = widenDown(mulLo(a0, a1, c0, c1) - mulHi(b0, b1, d0, d1));
  out[o + 1] = widenUp(mulHi(a0, a1, c0, c1) - mulLo(b0, b1, d0, d1));
  out[o + 2] = widenDown(mulLo(a0, a1, d0, d1) + mulLo(b0, b1, c0, c1));
  out[o + 3] = widenUp(mulHi(a0, a1, d0, d1) + mulHi(b0, b1, c0, c1));
}

/** a²: real part A² − B² (squares, not products), imaginary part 2·A·B. */
export function complexSqr(out: Float64Array, o: number, a: Float64Array, ia: number): void {
  const a0 = a[ia]!, a1 = a[ia + 1]!, b0 = a[ia + 2]!, b1 = a[ia + 3]!;
  const lo = widenDown(sqrLo(a0, a1) - sqrHi(b0, b1));
  const hi = widenUp(sqrHi(a0, a1) - sqrLo(b0, b1));
  const ilo = widenDown(2 * mulLo(a0, a1, b0, b1)); // doubling is exact except at overflow, so widen anyway
  const ihi = widenUp(2 * mulHi(a0, a1, b0, b1));
  out[o] = lo;
  out[o + 1] = hi;
  out[o + 2] = ilo;
  out[o + 3] = ihi;
}

/** The product of an exact complex double, stored as a degenerate rectangle at c[ic] (re = c[ic], im = c[ic + 2]), and a rectangle b. */
export function complexScale(out: Float64Array, o: number, c: Float64Array, ic: number, b: Float64Array, ib: number): void {
  const cr = c[ic]!, ci = c[ic + 2]!;
  const c0 = b[ib]!, c1 = b[ib + 1]!, d0 = b[ib + 2]!, d1 = b[ib + 3]!;
  const rc0 = cr * c0, rc1 = cr * c1, id0 = ci * d0, id1 = ci * d1, rd0 = cr * d0, rd1 = cr * d1, ic0 = ci * c0, ic1 = ci * c1;
  const check = rc0 + rc1 + id0 + id1 + rd0 + rd1 + ic0 + ic1;
  if (check - check === 0) {
    out[o] = widenDown(widenDown(Math.min(rc0, rc1)) - widenUp(Math.max(id0, id1)));
    out[o + 1] = widenUp(widenUp(Math.max(rc0, rc1)) - widenDown(Math.min(id0, id1)));
    out[o + 2] = widenDown(widenDown(Math.min(rd0, rd1)) + widenDown(Math.min(ic0, ic1)));
    out[o + 3] = widenUp(widenUp(Math.max(rd0, rd1)) + widenUp(Math.max(ic0, ic1)));
    return;
  }
  out[o] = widenDown(scaleLo(cr, c0, c1) - scaleHi(ci, d0, d1));
  out[o + 1] = widenUp(scaleHi(cr, c0, c1) - scaleLo(ci, d0, d1));
  out[o + 2] = widenDown(scaleLo(cr, d0, d1) + scaleLo(ci, c0, c1));
  out[o + 3] = widenUp(scaleHi(cr, d0, d1) + scaleHi(ci, c0, c1));
}

/** True when rectangle a lies in the interior of rectangle b (strict on all four sides; false on NaN). */
export function complexInInterior(a: Float64Array, ia: number, b: Float64Array, ib: number): boolean {
  return a[ia]! > b[ib]! && a[ia + 1]! < b[ib + 1]! && a[ia + 2]! > b[ib + 2]! && a[ia + 3]! < b[ib + 3]!;
}
