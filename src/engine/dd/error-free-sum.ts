/**
 * Error-free transformations of a sum (binary64, round to nearest, no overflow): s = RN(a + b) and the rounding
 * error e = (a + b) − s, which is itself a double, so a + b = s + e holds exactly and |e| ≤ ulp(s)/2 ≤ 2⁻⁵³·|s|.
 * twoSum is Knuth's branch-free version (The Art of Computer Programming, vol. 2, §4.2.2; Møller 1965, 6 flops);
 * quickTwoSum is Dekker's (Numer. Math. 18, 1971, 3 flops), which needs the larger operand first. Results go to
 * out[i] (s) and out[i + 1] (e); nothing is allocated.
 */

/** The exact error (a + b) − s of s = RN(a + b) (Knuth), for finite a, b whose sum does not overflow (5 flops). */
export function sumError(a: number, b: number, s: number): number {
  const bb = s - a;
  return (a - (s - bb)) + (b - bb);
}

/** out[i], out[i + 1] = s, e with s = RN(a + b) and a + b = s + e exactly, for any finite a, b whose sum does not overflow. */
export function twoSum(a: number, b: number, out: Float64Array, i: number): void {
  const s = a + b;
  out[i] = s;
  out[i + 1] = sumError(a, b, s);
}

/** out[i], out[i + 1] = s, e with a + b = s + e exactly, provided |a| ≥ |b| or a = 0 (Dekker's condition); else e may be wrong. */
export function quickTwoSum(a: number, b: number, out: Float64Array, i: number): void {
  const s = a + b;
  out[i] = s;
  out[i + 1] = b - (s - a);
}
