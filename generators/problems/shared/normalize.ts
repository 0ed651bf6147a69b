/**
 * Scales a packed complex vector so that its entry of largest modulus becomes exactly 1 (a new array; the zero
 * vector is returned as zeros). Projective coordinates of a real point become real under this scaling, so
 * realness can be judged on the result.
 */
export function normalizeByLargest(x: Float64Array): Float64Array {
  let k = 0;
  let best = -1;
  for (let i = 0; i < x.length; i += 2) {
    const m = Math.hypot(x[i]!, x[i + 1]!);
    if (m > best * (1 + 1e-12)) { best = m; k = i; }
  }
  const out = new Float64Array(x.length);
  if (best <= 0) return out;
  const re = x[k]!, im = x[k + 1]!, n = re * re + im * im;
  for (let i = 0; i < x.length; i += 2) {
    out[i] = (x[i]! * re + x[i + 1]! * im) / n;
    out[i + 1] = (x[i + 1]! * re - x[i]! * im) / n;
  }
  out[k] = 1;
  out[k + 1] = 0;
  return out;
}
