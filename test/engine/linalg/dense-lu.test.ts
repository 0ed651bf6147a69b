import { describe, expect, it } from 'vitest';
import { createDenseLU } from '../../../src/engine/linalg/dense-lu.ts';
import { matVec, normInf } from '../../../src/engine/complex/packed.ts';
import { createRandom } from '../../../src/engine/random.ts';

function randomMatrix(n: number, seed: number): Float64Array {
  const r = createRandom(seed);
  const m = new Float64Array(2 * n * n);
  for (let k = 0; k < n * n; k++) r.gaussianComplex(m, 2 * k);
  return m;
}

describe('dense complex LU with partial pivoting', () => {
  // Golub–Van Loan, Matrix Computations (4th ed.), §3.4: backward stable; residual ‖Ax − b‖ ≈ n·u·‖A‖‖x‖.
  it.each([1, 2, 3, 5, 8, 16, 24])('solves a random complex %i×%i system to a small residual', (n) => {
    const a = randomMatrix(n, 100 + n);
    const b = new Float64Array(2 * n), x = new Float64Array(2 * n), ax = new Float64Array(2 * n);
    createRandom(7).gaussianComplex(b, 0);
    for (let i = 0; i < 2 * n; i++) b[i] = Math.sin(i + 1);
    const lu = createDenseLU(n);
    expect(Number.isFinite(lu.factor(a))).toBe(true);
    lu.solve(b, x);
    matVec(ax, a, x, n, n);
    for (let i = 0; i < 2 * n; i++) ax[i] = ax[i]! - b[i]!;
    expect(normInf(ax)).toBeLessThan(1e-12 * (1 + normInf(x)) * n);
  });

  it('inverts the 2×2 matrix [[1, i], [i, 2]] exactly as the adjugate formula gives (det = 3)', () => {
    // inverse = (1/3)·[[2, −i], [−i, 1]] (hand arithmetic)
    const a = new Float64Array([1, 0, 0, 1, 0, 1, 2, 0]);
    const lu = createDenseLU(2);
    lu.factor(a);
    const col = new Float64Array(4);
    lu.solve(new Float64Array([1, 0, 0, 0]), col);
    [2 / 3, 0, 0, -1 / 3].forEach((v, i) => expect(col[i]).toBeCloseTo(v, 15));
    lu.solve(new Float64Array([0, 0, 1, 0]), col);
    [0, -1 / 3, 1 / 3, 0].forEach((v, i) => expect(col[i]).toBeCloseTo(v, 15));
  });

  it('solves with the conjugate transpose (Aᴴ y = b)', () => {
    const n = 6, a = randomMatrix(n, 3), lu = createDenseLU(n);
    lu.factor(a);
    const b = new Float64Array(2 * n).map((_, i) => Math.cos(i));
    const y = new Float64Array(2 * n), ahy = new Float64Array(2 * n);
    lu.solveAdjoint(b, y);
    const ah = new Float64Array(2 * n * n);
    for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) {
      ah[2 * (i * n + j)] = a[2 * (j * n + i)]!;
      ah[2 * (i * n + j) + 1] = -a[2 * (j * n + i) + 1]!;
    }
    matVec(ahy, ah, y, n, n);
    for (let i = 0; i < 2 * n; i++) expect(ahy[i]).toBeCloseTo(b[i]!, 11);
  });

  it('estimates κ₁ of diag(1, 1e-8) as 1e8 (exact for diagonal matrices: ‖A‖₁‖A⁻¹‖₁)', () => {
    const lu = createDenseLU(2);
    expect(lu.factor(new Float64Array([1, 0, 0, 0, 0, 0, 1e-8, 0]))).toBeCloseTo(1e8, -1);
  });

  it('the condition estimate is within a factor n of κ₁ computed from the explicit inverse (Higham 1988)', () => {
    const n = 8, a = randomMatrix(n, 11), lu = createDenseLU(n);
    const estimate = lu.factor(a);
    let normA = 0, normInv = 0;
    const col = new Float64Array(2 * n), e = new Float64Array(2 * n);
    for (let j = 0; j < n; j++) {
      let s = 0;
      for (let i = 0; i < n; i++) s += Math.hypot(a[2 * (i * n + j)]!, a[2 * (i * n + j) + 1]!);
      normA = Math.max(normA, s);
      e.fill(0);
      e[2 * j] = 1;
      lu.solve(e, col);
      let t = 0;
      for (let i = 0; i < n; i++) t += Math.hypot(col[2 * i]!, col[2 * i + 1]!);
      normInv = Math.max(normInv, t);
    }
    const exact = normA * normInv;
    expect(estimate).toBeLessThanOrEqual(exact * (1 + 1e-12));
    expect(estimate).toBeGreaterThanOrEqual(exact / n);
  });

  it('reports Infinity for a singular matrix', () => {
    const lu = createDenseLU(2);
    expect(lu.factor(new Float64Array([1, 1, 2, 2, 2, 2, 4, 4]))).toBe(Infinity);
  });
});
