import { describe, expect, it } from 'vitest';
import { createTracePencil, type PencilHyperplane } from '../../../src/engine/complete/trace-pencil.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { apolloniusGeneric, twoConicsDemo, twoCubicsGeneric, type SolvedInstance } from './fixtures.ts';

/** Determinant of a packed complex k×k matrix by Gaussian elimination with partial pivoting (test helper). */
function determinant(m: Float64Array, k: number): [number, number] {
  const a = m.slice();
  let dr = 1, di = 0;
  for (let c = 0; c < k; c++) {
    let p = c;
    for (let r = c + 1; r < k; r++) if (Math.hypot(a[2 * (r * k + c)]!, a[2 * (r * k + c) + 1]!) > Math.hypot(a[2 * (p * k + c)]!, a[2 * (p * k + c) + 1]!)) p = r;
    if (p !== c) { for (let j = 0; j < 2 * k; j++) { const t = a[2 * c * k + j]!; a[2 * c * k + j] = a[2 * p * k + j]!; a[2 * p * k + j] = t; } dr = -dr; di = -di; }
    const pr = a[2 * (c * k + c)]!, pi = a[2 * (c * k + c) + 1]!;
    [dr, di] = [dr * pr - di * pi, dr * pi + di * pr];
    const pp = pr * pr + pi * pi;
    for (let r = c + 1; r < k; r++) {
      const xr = a[2 * (r * k + c)]!, xi = a[2 * (r * k + c) + 1]!;
      const fr = (xr * pr + xi * pi) / pp, fi = (xi * pr - xr * pi) / pp;
      for (let j = c; j < k; j++) {
        const yr = a[2 * (c * k + j)]!, yi = a[2 * (c * k + j) + 1]!;
        a[2 * (r * k + j)] = a[2 * (r * k + j)]! - (fr * yr - fi * yi);
        a[2 * (r * k + j) + 1] = a[2 * (r * k + j) + 1]! - (fr * yi + fi * yr);
      }
    }
  }
  return [dr, di];
}

// Every equation of these systems has the same degree in the unknowns (common practice, no source).
const cases: readonly [string, () => Promise<SolvedInstance>, PencilHyperplane, number][] = [
  ['two conics, real demo', twoConicsDemo, 'generic', 2],
  ['two cubics', twoCubicsGeneric, 'coordinate', 3],
  ['circles tangent to three circles', apolloniusGeneric, 'generic', 2],
];

describe.each(cases)('the trace pencil of %s (construction of runTraceTest, a = %s)', (_, load, hyperplane, degree) => {
  it('lifts every given solution to a solution of G at λ = 0 with s = 0 and b·X = 1', async () => {
    const inst = await load();
    const pencil = createTracePencil(inst.system, inst.parameters, inst.solutions, createRandom(5), hyperplane);
    const n = pencil.n, size = n + 2, value = new Float64Array(2 * size), lambda = new Float64Array(2);
    for (const x of inst.solutions) {
      const z = pencil.lift(x);
      expect(Math.hypot(z[2 * n + 2]!, z[2 * n + 3]!)).toBe(0);
      pencil.compiled.evaluate(z, lambda, value, null, null);
      // ‖G‖∞ relative to ‖Z‖∞: the given solutions are refined to about 1e-15 (solveSystem's Newton).
      const big = Math.max(...Array.from(z, Math.abs));
      expect(Math.max(...Array.from(value, Math.abs)) / (1 + big)).toBeLessThan(1e-11);
    }
  });
  it('homogenises each equation to its degree in x: F̂(2X; p₀ + s·v) = 2^d · F̂(X; p₀ + s·v)', async () => {
    const inst = await load();
    const pencil = createTracePencil(inst.system, inst.parameters, inst.solutions, createRandom(6), hyperplane);
    const n = pencil.n, size = n + 2, random = createRandom(7);
    const z = new Float64Array(2 * size);
    for (let i = 0; i < size; i++) random.gaussianComplex(z, 2 * i);
    const twice = z.slice();
    for (let i = 0; i < 2 * (n + 1); i++) twice[i] = 2 * twice[i]!;
    const v1 = new Float64Array(2 * size), v2 = new Float64Array(2 * size), lambda = new Float64Array(2);
    pencil.compiled.evaluate(z, lambda, v1, null, null);
    pencil.compiled.evaluate(twice, lambda, v2, null, null);
    for (let i = 0; i < 2 * n; i++) expect(v2[i]!).toBeCloseTo(2 ** degree * v1[i]!, 9);
  });
  it('is nonsingular at the lifts: det ∂G/∂(X, s) = (a·X)·det[∂F̂/∂X; b] (Euler relation, b·X = 1)', async () => {
    const inst = await load();
    const pencil = createTracePencil(inst.system, inst.parameters, inst.solutions, createRandom(8), hyperplane);
    const n = pencil.n, size = n + 2;
    const value = new Float64Array(2 * size), jac = new Float64Array(2 * size * size), lambda = new Float64Array(2);
    for (const x of inst.solutions) {
      const z = pencil.lift(x);
      pencil.compiled.evaluate(z, lambda, value, jac, null);
      const minor = new Float64Array(2 * (n + 1) * (n + 1));
      for (let r = 0; r <= n; r++) for (let c = 0; c <= n; c++) {
        minor[2 * (r * (n + 1) + c)] = jac[2 * (r * size + c)]!;
        minor[2 * (r * (n + 1) + c) + 1] = jac[2 * (r * size + c) + 1]!;
      }
      const full = determinant(jac, size), part = determinant(minor, n + 1);
      const ar = jac[2 * ((n + 1) * size + n + 1)]!, ai = jac[2 * ((n + 1) * size + n + 1) + 1]!; // ∂(s·a·X)/∂s = a·X at s = 0
      const expected = [ar * part[0] - ai * part[1], ar * part[1] + ai * part[0]];
      expect(Math.hypot(full[0] - expected[0]!, full[1] - expected[1]!)).toBeLessThan(1e-9 * Math.hypot(full[0], full[1]));
      expect(Math.hypot(full[0], full[1])).toBeGreaterThan(0);
      expect(pencil.hyperplaneDistance(z)).toBeGreaterThan(1e-6);
    }
  });
});

describe('trace pencil input checks', () => {
  it('refuses a non-square system and parameters of the wrong length', async () => {
    const inst = await twoConicsDemo();
    const short = { ...inst.system, equations: inst.system.equations.slice(1) };
    expect(() => createTracePencil(short, inst.parameters, inst.solutions, createRandom(1), 'generic')).toThrow(/square/);
    expect(() => createTracePencil(inst.system, inst.parameters.subarray(2), inst.solutions, createRandom(1), 'generic')).toThrow(/length/);
  });
});
