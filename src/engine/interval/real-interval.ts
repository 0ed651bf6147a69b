import { widenDown, widenUp } from './outward.ts';
import { endProduct, mulHi, mulLo, sqrHi, sqrLo } from './bounds.ts';

/**
 * Real interval arithmetic on [lo, hi] pairs stored in Float64Arrays: op(out, o, a, ia, b, ib) writes the
 * enclosure of {x op y : x ∈ a, y ∈ b} to out[o], out[o + 1]. Every correctly rounded endpoint is widened at least one
 * float outward, so the exact result is enclosed without rounding-mode control. A NaN endpoint means "no
 * enclosure" (e.g. sqrt of a negative interval) and propagates.
 */

/** a + b. */
export function intervalAdd(out: Float64Array, o: number, a: Float64Array, ia: number, b: Float64Array, ib: number): void {
  const lo = a[ia]! + b[ib]!;
  const hi = a[ia + 1]! + b[ib + 1]!;
  out[o] = widenDown(lo);
  out[o + 1] = widenUp(hi);
}

/** a − b. */
export function intervalSub(out: Float64Array, o: number, a: Float64Array, ia: number, b: Float64Array, ib: number): void {
  const lo = a[ia]! - b[ib + 1]!;
  const hi = a[ia + 1]! - b[ib]!;
  out[o] = widenDown(lo);
  out[o + 1] = widenUp(hi);
}

/** a · b (with 0 · ∞ = 0 at the endpoints). */
export function intervalMul(out: Float64Array, o: number, a: Float64Array, ia: number, b: Float64Array, ib: number): void {
  const a0 = a[ia]!, a1 = a[ia + 1]!, b0 = b[ib]!, b1 = b[ib + 1]!;
  out[o] = mulLo(a0, a1, b0, b1);
  out[o + 1] = mulHi(a0, a1, b0, b1);
}

/** a / b; the whole line [−∞, ∞] when b contains 0 or an endpoint quotient is undefined (∞/∞). */
export function intervalDiv(out: Float64Array, o: number, a: Float64Array, ia: number, b: Float64Array, ib: number): void {
  const a0 = a[ia]!, a1 = a[ia + 1]!, b0 = b[ib]!, b1 = b[ib + 1]!;
  if (a0 !== a0 || a1 !== a1 || b0 !== b0 || b1 !== b1) { out[o] = NaN; out[o + 1] = NaN; return; }
  if (b0 <= 0 && b1 >= 0) { out[o] = -Infinity; out[o + 1] = Infinity; return; }
  const p = a0 / b0, q = a0 / b1, r = a1 / b0, s = a1 / b1;
  if (p !== p || q !== q || r !== r || s !== s) { out[o] = -Infinity; out[o + 1] = Infinity; return; }
  out[o] = widenDown(Math.min(p, q, r, s));
  out[o + 1] = widenUp(Math.max(p, q, r, s));
}

/** a², tighter than a · a when a contains 0 (the lower end is then 0). */
export function intervalSqr(out: Float64Array, o: number, a: Float64Array, ia: number): void {
  const a0 = a[ia]!, a1 = a[ia + 1]!;
  out[o] = sqrLo(a0, a1);
  out[o + 1] = sqrHi(a0, a1);
}

/** √a over the non-negative part of a; NaN (empty) when a lies wholly below 0. */
export function intervalSqrt(out: Float64Array, o: number, a: Float64Array, ia: number): void {
  const a0 = a[ia]!, a1 = a[ia + 1]!;
  if (a0 !== a0 || a1 !== a1 || a1 < 0) { out[o] = NaN; out[o + 1] = NaN; return; }
  out[o] = a0 <= 0 ? 0 : Math.max(0, widenDown(Math.sqrt(a0)));
  out[o + 1] = widenUp(Math.sqrt(a1));
}

/** −a (exact). */
export function intervalNeg(out: Float64Array, o: number, a: Float64Array, ia: number): void {
  const a0 = a[ia]!;
  out[o] = -a[ia + 1]!;
  out[o + 1] = -a0;
}

/** The product of an exact double c and an interval b. */
export function intervalScale(out: Float64Array, o: number, c: number, b: Float64Array, ib: number): void {
  const b0 = b[ib]!, b1 = b[ib + 1]!;
  const p = endProduct(c, b0), q = endProduct(c, b1);
  out[o] = widenDown(Math.min(p, q));
  out[o + 1] = widenUp(Math.max(p, q));
}
