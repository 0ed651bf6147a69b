/**
 * Approximate inverse of a dense complex matrix by Gauss–Jordan elimination with partial pivoting (pivot size
 * |re| + |im|), in plain floating point. Certification needs only *some* matrix Y close to J⁻¹: soundness comes
 * from the interval part of Krawczyk's test, never from Y. Matrices are packed complex, row-major, 2n² doubles.
 */

/** Writes an approximate inverse of a (n×n) into inverse; a is overwritten. False when a pivot is 0 or not finite. */
export function invertComplex(a: Float64Array, n: number, inverse: Float64Array): boolean {
  inverse.fill(0);
  for (let i = 0; i < n; i++) inverse[2 * (i * n + i)] = 1;
  for (let k = 0; k < n; k++) {
    let p = k;
    let best = -1;
    for (let i = k; i < n; i++) {
      const s = Math.abs(a[2 * (i * n + k)]!) + Math.abs(a[2 * (i * n + k) + 1]!);
      if (s > best) { best = s; p = i; }
    }
    if (!(best > 0) || !Number.isFinite(best)) return false;
    if (p !== k) { swapRows(a, n, p, k); swapRows(inverse, n, p, k); }
    const pr = a[2 * (k * n + k)]!, pi = a[2 * (k * n + k) + 1]!;
    const d = pr * pr + pi * pi;
    const qr = pr / d, qi = -pi / d; // 1 / pivot
    scaleRow(a, n, k, qr, qi);
    scaleRow(inverse, n, k, qr, qi);
    for (let i = 0; i < n; i++) {
      if (i === k) continue;
      const fr = a[2 * (i * n + k)]!, fi = a[2 * (i * n + k) + 1]!;
      if (fr === 0 && fi === 0) continue;
      subtractRow(a, n, i, k, fr, fi);
      subtractRow(inverse, n, i, k, fr, fi);
    }
  }
  for (let k = 0; k < 2 * n * n; k++) if (!Number.isFinite(inverse[k]!)) return false;
  return true;
}

function swapRows(m: Float64Array, n: number, r: number, s: number): void {
  for (let j = 0; j < 2 * n; j++) {
    const t = m[2 * r * n + j]!;
    m[2 * r * n + j] = m[2 * s * n + j]!;
    m[2 * s * n + j] = t;
  }
}

function scaleRow(m: Float64Array, n: number, r: number, cr: number, ci: number): void {
  for (let j = 0; j < n; j++) {
    const o = 2 * (r * n + j);
    const xr = m[o]!, xi = m[o + 1]!;
    m[o] = xr * cr - xi * ci;
    m[o + 1] = xr * ci + xi * cr;
  }
}

function subtractRow(m: Float64Array, n: number, target: number, source: number, fr: number, fi: number): void {
  for (let j = 0; j < n; j++) {
    const s = 2 * (source * n + j), t = 2 * (target * n + j);
    const xr = m[s]!, xi = m[s + 1]!;
    m[t] = m[t]! - (fr * xr - fi * xi);
    m[t + 1] = m[t + 1]! - (fr * xi + fi * xr);
  }
}

/** out = M · v for a packed complex n×n matrix and vector (plain floating point). */
export function multiplyComplex(m: Float64Array, v: Float64Array, n: number, out: Float64Array): void {
  for (let i = 0; i < n; i++) {
    let re = 0, im = 0;
    for (let k = 0; k < n; k++) {
      const mr = m[2 * (i * n + k)]!, mi = m[2 * (i * n + k) + 1]!;
      const vr = v[2 * k]!, vi = v[2 * k + 1]!;
      re += mr * vr - mi * vi;
      im += mr * vi + mi * vr;
    }
    out[2 * i] = re;
    out[2 * i + 1] = im;
  }
}
