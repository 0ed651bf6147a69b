import type { ExpandedTerm } from '../expr/expand.ts';

/** Powers of two that put a system in natural units: x_j = 2^variables[j]·y_j, equation i multiplied by 2^equations[i]. */
export interface SystemScaling {
  readonly variables: readonly number[];
  readonly equations: readonly number[];
}

/** Scale exponents are clamped to ±LIMIT, far inside double range (2^±1023) so scaled values cannot overflow. */
const LIMIT = 400;
/** Ridge weight (relative to the normal matrix's mean diagonal) that picks the smallest scaling among equal fits. */
const RIDGE = 1e-6;

/**
 * Coefficient scaling after Morgan (Solving Polynomial Systems Using Continuation for Engineering and Scientific
 * Problems, 1987, ch. 5; Meintjes–Morgan, Appl. Math. Comput. 22, 1987): choose variable exponents c and equation
 * exponents r minimising Σ_i Σ_α (log₂|a_iα| + r_i + α·c)² over the nonzero terms a_iα·x^α, so that in the scaled
 * unknowns y (x = 2^c ⊙ y) and scaled equations every coefficient is as close to 1 in modulus as a least-squares
 * fit allows. Eliminating r leaves a real n×n normal system in c (with a small ridge that picks the least scaling
 * where the fit does not care, e.g. along the homogeneous direction of a homogeneous system); c is rounded to
 * integers, then r_i = −round(mean_α(log₂|a_iα| + α·c)). Powers of two scale exactly. A system that is already
 * well scaled gets exponents near 0; unknowns scaled by σ (x ↦ x/σ inside every term) get c ≈ log₂ σ back.
 */
export function coefficientScaling(terms: readonly (readonly ExpandedTerm[])[], n: number): SystemScaling {
  const A = new Float64Array(n * n), b = new Float64Array(n);
  const mean = new Float64Array(n);
  for (const eq of terms) {
    if (eq.length < 2) continue;
    mean.fill(0);
    let meanLog = 0;
    for (const t of eq) {
      meanLog += Math.log2(Math.hypot(t.re, t.im));
      for (let j = 0; j < n; j++) mean[j]! += t.exponents[j]!;
    }
    meanLog /= eq.length;
    for (let j = 0; j < n; j++) mean[j]! /= eq.length;
    for (const t of eq) {
      const l = Math.log2(Math.hypot(t.re, t.im)) - meanLog;
      for (let j = 0; j < n; j++) {
        const dj = t.exponents[j]! - mean[j]!;
        if (dj === 0) continue;
        b[j]! -= dj * l;
        for (let k = 0; k < n; k++) A[j * n + k]! += dj * (t.exponents[k]! - mean[k]!);
      }
    }
  }
  let trace = 0;
  for (let j = 0; j < n; j++) trace += A[j * n + j]!;
  const ridge = RIDGE * Math.max(trace / n, 1);
  for (let j = 0; j < n; j++) A[j * n + j]! += ridge;
  const c = solveSymmetric(A, b, n).map((v) => clamp(Math.round(v)));
  const equations = terms.map((eq) => {
    if (eq.length === 0) return 0;
    let s = 0;
    for (const t of eq) {
      s += Math.log2(Math.hypot(t.re, t.im));
      for (let j = 0; j < n; j++) s += t.exponents[j]! * c[j]!;
    }
    return clamp(-Math.round(s / eq.length));
  });
  return { variables: c.map((v) => v + 0), equations: equations.map((v) => v + 0) };
}

/** The identity scaling (all exponents 0) for n unknowns and neq equations. */
export function noScaling(n: number, neq = n): SystemScaling {
  return { variables: new Array<number>(n).fill(0), equations: new Array<number>(neq).fill(0) };
}

function clamp(v: number): number {
  return Math.max(-LIMIT, Math.min(LIMIT, v));
}

/** Solves the symmetric positive definite system A·x = b (row-major n×n, overwritten) by Gaussian elimination with partial pivoting. */
function solveSymmetric(A: Float64Array, b: Float64Array, n: number): number[] {
  const x = Array.from(b);
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(A[i * n + k]!) > Math.abs(A[p * n + k]!)) p = i;
    if (p !== k) {
      for (let j = 0; j < n; j++) { const t = A[k * n + j]!; A[k * n + j] = A[p * n + j]!; A[p * n + j] = t; }
      const t = x[k]!; x[k] = x[p]!; x[p] = t;
    }
    const d = A[k * n + k]!;
    if (d === 0) continue;
    for (let i = k + 1; i < n; i++) {
      const f = A[i * n + k]! / d;
      if (f === 0) continue;
      for (let j = k; j < n; j++) A[i * n + j]! -= f * A[k * n + j]!;
      x[i]! -= f * x[k]!;
    }
  }
  for (let k = n - 1; k >= 0; k--) {
    let s = x[k]!;
    for (let j = k + 1; j < n; j++) s -= A[k * n + j]! * x[j]!;
    x[k] = A[k * n + k]! === 0 ? 0 : s / A[k * n + k]!;
  }
  return x;
}
