import type { LinearSolver } from '../homotopy.ts';
import { estimateInverseNorm1 } from './inverse-norm.ts';

/** A dense solver that can also solve with the conjugate transpose (used by the condition estimate). */
export interface DenseSolver extends LinearSolver {
  readonly n: number;
  /** Solves Aᴴ·out = b with the last factored matrix; `out` may alias `b`. Allocates nothing. */
  solveAdjoint(b: Float64Array, out: Float64Array): void;
}

/**
 * Dense complex LU with partial pivoting (largest modulus in the column; Golub–Van Loan, Alg. 3.4.1) for one
 * n×n packed row-major matrix at a time. `factor` copies the matrix, factors PA = LU and returns
 * κ₁(A) ≈ ‖A‖₁·‖A⁻¹‖₁ with ‖A⁻¹‖₁ from the Hager–Higham estimator (a lower bound, in practice within a small
 * factor); Infinity on a zero or non-finite pivot. Buffers are made once here.
 */
export function createDenseLU(n: number): DenseSolver {
  const lu = new Float64Array(2 * n * n);
  const perm = new Int32Array(n);
  const work = new Float64Array(2 * n);
  let singular = false;

  const solve = (b: Float64Array, out: Float64Array): void => {
    for (let i = 0; i < n; i++) {
      work[2 * i] = b[2 * perm[i]!]!;
      work[2 * i + 1] = b[2 * perm[i]! + 1]!;
    }
    for (let i = 0; i < n; i++) {
      let re = work[2 * i]!, im = work[2 * i + 1]!;
      const row = 2 * i * n;
      for (let j = 0; j < i; j++) {
        const lr = lu[row + 2 * j]!, li = lu[row + 2 * j + 1]!, wr = work[2 * j]!, wi = work[2 * j + 1]!;
        re -= lr * wr - li * wi;
        im -= lr * wi + li * wr;
      }
      work[2 * i] = re;
      work[2 * i + 1] = im;
    }
    for (let i = n - 1; i >= 0; i--) {
      let re = work[2 * i]!, im = work[2 * i + 1]!;
      const row = 2 * i * n;
      for (let j = i + 1; j < n; j++) {
        const ur = lu[row + 2 * j]!, ui = lu[row + 2 * j + 1]!, wr = work[2 * j]!, wi = work[2 * j + 1]!;
        re -= ur * wr - ui * wi;
        im -= ur * wi + ui * wr;
      }
      const dr = lu[row + 2 * i]!, di = lu[row + 2 * i + 1]!;
      const d = dr * dr + di * di;
      work[2 * i] = (re * dr + im * di) / d;
      work[2 * i + 1] = (im * dr - re * di) / d;
    }
    for (let i = 0; i < 2 * n; i++) out[i] = work[i]!;
  };

  const solveAdjoint = (b: Float64Array, out: Float64Array): void => {
    for (let i = 0; i < 2 * n; i++) work[i] = b[i]!;
    // Uᴴ w = b: forward substitution with conj(U) transposed.
    for (let i = 0; i < n; i++) {
      let re = work[2 * i]!, im = work[2 * i + 1]!;
      for (let j = 0; j < i; j++) {
        const k = 2 * (j * n + i);
        const ur = lu[k]!, ui = -lu[k + 1]!, wr = work[2 * j]!, wi = work[2 * j + 1]!;
        re -= ur * wr - ui * wi;
        im -= ur * wi + ui * wr;
      }
      const k = 2 * (i * n + i);
      const dr = lu[k]!, di = -lu[k + 1]!;
      const d = dr * dr + di * di;
      work[2 * i] = (re * dr + im * di) / d;
      work[2 * i + 1] = (im * dr - re * di) / d;
    }
    // Lᴴ v = w: backward substitution, unit diagonal.
    for (let i = n - 1; i >= 0; i--) {
      let re = work[2 * i]!, im = work[2 * i + 1]!;
      for (let j = i + 1; j < n; j++) {
        const k = 2 * (j * n + i);
        const lr = lu[k]!, li = -lu[k + 1]!, wr = work[2 * j]!, wi = work[2 * j + 1]!;
        re -= lr * wr - li * wi;
        im -= lr * wi + li * wr;
      }
      work[2 * i] = re;
      work[2 * i + 1] = im;
    }
    for (let i = 0; i < n; i++) {
      out[2 * perm[i]!] = work[2 * i]!;
      out[2 * perm[i]! + 1] = work[2 * i + 1]!;
    }
  };

  const solver: DenseSolver = {
    n,
    factor(matrix) {
      let norm1 = 0;
      for (let j = 0; j < n; j++) {
        let s = 0;
        for (let i = 0; i < n; i++) {
          const k = 2 * (i * n + j);
          s += Math.sqrt(matrix[k]! * matrix[k]! + matrix[k + 1]! * matrix[k + 1]!);
        }
        if (s > norm1 || s !== s) norm1 = s;
      }
      for (let i = 0; i < 2 * n * n; i++) lu[i] = matrix[i]!;
      singular = !factorInPlace(lu, perm, n);
      if (singular || !Number.isFinite(norm1)) return Infinity;
      if (norm1 === 0) return Infinity;
      const inv = estimateInverseNorm1(solver, n);
      return Number.isFinite(inv) ? norm1 * inv : Infinity;
    },
    factorOnly(matrix) {
      for (let i = 0; i < 2 * n * n; i++) lu[i] = matrix[i]!;
      singular = !factorInPlace(lu, perm, n);
      return !singular;
    },
    solve,
    solveAdjoint,
  };
  return solver;
}

/** In-place PA = LU with partial pivoting; perm[i] = original row now at row i. false on a zero or non-finite pivot. */
function factorInPlace(a: Float64Array, perm: Int32Array, n: number): boolean {
  for (let i = 0; i < n; i++) perm[i] = i;
  for (let k = 0; k < n; k++) {
    let p = k, best = -1;
    for (let i = k; i < n; i++) {
      const q = 2 * (i * n + k);
      const m = a[q]! * a[q]! + a[q + 1]! * a[q + 1]!;
      if (m > best) { best = m; p = i; }
    }
    if (!(best > 0) || !Number.isFinite(best)) return false;
    if (p !== k) {
      for (let j = 0; j < 2 * n; j++) {
        const t = a[2 * k * n + j]!;
        a[2 * k * n + j] = a[2 * p * n + j]!;
        a[2 * p * n + j] = t;
      }
      const t = perm[k]!; perm[k] = perm[p]!; perm[p] = t;
    }
    const dk = 2 * (k * n + k);
    const pr = a[dk]!, pi = a[dk + 1]!;
    const pd = pr * pr + pi * pi;
    const ir = pr / pd, ii = -pi / pd;
    for (let i = k + 1; i < n; i++) {
      const q = 2 * (i * n + k);
      const ar = a[q]!, ai = a[q + 1]!;
      if (ar === 0 && ai === 0) continue;
      const mr = ar * ir - ai * ii, mi = ar * ii + ai * ir;
      a[q] = mr;
      a[q + 1] = mi;
      const rowI = 2 * i * n, rowK = 2 * k * n;
      for (let j = k + 1; j < n; j++) {
        const ur = a[rowK + 2 * j]!, ui = a[rowK + 2 * j + 1]!;
        const q = rowI + 2 * j;
        a[q] = a[q]! - (mr * ur - mi * ui);
        a[q + 1] = a[q + 1]! - (mr * ui + mi * ur);
      }
    }
  }
  return true;
}
