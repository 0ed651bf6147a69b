/**
 * Kernels on packed complex vectors: a Float64Array of length 2n holds n complex numbers as (re, im) pairs.
 * Every kernel loops over the given length only, allocates nothing and is exact up to one rounding per
 * arithmetic operation (no fused or compensated sums).
 */

/** ‖v‖∞ = max_i |v_i| over complex entries (modulus via Math.hypot-free sqrt(re² + im²); may overflow past 1e154). */
export function normInf(v: Float64Array, n = v.length >> 1): number {
  let m = 0;
  for (let i = 0; i < 2 * n; i += 2) {
    const a = v[i]!, b = v[i + 1]!;
    const s = a * a + b * b;
    if (s > m || s !== s) m = s;
  }
  return Math.sqrt(m);
}

/** ‖v‖₂ for a packed complex vector. */
export function norm2(v: Float64Array, n = v.length >> 1): number {
  let s = 0;
  for (let i = 0; i < 2 * n; i++) s += v[i]! * v[i]!;
  return Math.sqrt(s);
}

/** max_i |a_i − b_i| over complex entries. */
export function distInf(a: Float64Array, b: Float64Array, n = a.length >> 1): number {
  let m = 0;
  for (let i = 0; i < 2 * n; i += 2) {
    const re = a[i]! - b[i]!, im = a[i + 1]! - b[i + 1]!;
    const s = re * re + im * im;
    if (s > m || s !== s) m = s;
  }
  return Math.sqrt(m);
}

/** out = x + (aRe + i·aIm)·y, entrywise over n complex entries; out may alias x or y. */
export function axpy(out: Float64Array, x: Float64Array, aRe: number, aIm: number, y: Float64Array, n = x.length >> 1): void {
  for (let i = 0; i < 2 * n; i += 2) {
    const yr = y[i]!, yi = y[i + 1]!;
    out[i] = x[i]! + aRe * yr - aIm * yi;
    out[i + 1] = x[i + 1]! + aRe * yi + aIm * yr;
  }
}

/** out = (aRe + i·aIm)·x; out may alias x. */
export function scale(out: Float64Array, aRe: number, aIm: number, x: Float64Array, n = x.length >> 1): void {
  for (let i = 0; i < 2 * n; i += 2) {
    const xr = x[i]!, xi = x[i + 1]!;
    out[i] = aRe * xr - aIm * xi;
    out[i + 1] = aRe * xi + aIm * xr;
  }
}

/** Σ conj(a_i)·b_i written to out[0], out[1] (the Hermitian inner product ⟨a, b⟩). */
export function dotc(out: Float64Array, a: Float64Array, b: Float64Array, n = a.length >> 1): void {
  let re = 0, im = 0;
  for (let i = 0; i < 2 * n; i += 2) {
    const ar = a[i]!, ai = a[i + 1]!, br = b[i]!, bi = b[i + 1]!;
    re += ar * br + ai * bi;
    im += ar * bi - ai * br;
  }
  out[0] = re;
  out[1] = im;
}

/**
 * Σ a_i·b_i (the bilinear product, no conjugation) of n packed complex entries read from offsets ao and bo, written to
 * out[oo], out[oo + 1]; accumulated left to right from 0. The fixed-size unrolled kernels of a family's hot loop
 * (conic-kernels.ts) stay unrolled on purpose.
 */
export function dotu(out: Float64Array, a: Float64Array, b: Float64Array, n: number, ao = 0, bo = 0, oo = 0): void {
  let re = 0, im = 0;
  for (let j = 0; j < n; j++) {
    const ar = a[ao + 2 * j]!, ai = a[ao + 2 * j + 1]!, br = b[bo + 2 * j]!, bi = b[bo + 2 * j + 1]!;
    re += ar * br - ai * bi;
    im += ar * bi + ai * br;
  }
  out[oo] = re;
  out[oo + 1] = im;
}

/** true when every entry is a finite number. */
export function allFinite(v: Float64Array, length = v.length): boolean {
  for (let i = 0; i < length; i++) if (!Number.isFinite(v[i]!)) return false;
  return true;
}

/** out = M·v for a packed complex rows×cols row-major matrix M and a packed vector v of length 2·cols. */
export function matVec(out: Float64Array, m: Float64Array, v: Float64Array, rows: number, cols: number): void {
  for (let i = 0; i < rows; i++) {
    let re = 0, im = 0;
    const row = 2 * i * cols;
    for (let j = 0; j < cols; j++) {
      const mr = m[row + 2 * j]!, mi = m[row + 2 * j + 1]!, vr = v[2 * j]!, vi = v[2 * j + 1]!;
      re += mr * vr - mi * vi;
      im += mr * vi + mi * vr;
    }
    out[2 * i] = re;
    out[2 * i + 1] = im;
  }
}

/** Writes the complex quotient (ar + i·ai)/(br + i·bi) to out[k], out[k + 1] (Smith's algorithm: no overflow for moderate inputs). */
export function cdiv(out: Float64Array, k: number, ar: number, ai: number, br: number, bi: number): void {
  if (Math.abs(br) >= Math.abs(bi)) {
    const r = bi / br, d = br + bi * r;
    out[k] = (ar + ai * r) / d;
    out[k + 1] = (ai - ar * r) / d;
  } else {
    const r = br / bi, d = bi + br * r;
    out[k] = (ar * r + ai) / d;
    out[k + 1] = (ai * r - ar) / d;
  }
}
