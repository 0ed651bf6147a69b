import { describe, expect, it } from 'vitest';
import { bitangentEquations, pointOnChartLine } from '../../../../generators/problems/plane-curves/bitangent-equations.ts';
import { coefficientsOf, linearForm, product, sum } from '../../../../generators/problems/shared/numeric-polynomial.ts';
import { monomialExponents } from '../../../../generators/problems/shared/monomials.ts';
import { exprBuilders as ops } from '../../../../src/engine/index.ts';
import { largestResidual, real } from '../shared/evaluate.ts';

const exponents = monomialExponents(2, 5);
// f = (y − x − 1)·h + (x² + 0.5x − 1)²·(x − 2) with h an arbitrary quartic: on the line y = x + 1, f is
// (x² + 0.5x − 1)²(x − 2), so the line is a bitangent touching where x² + 0.5x − 1 = 0 and crossing at x = 2 (a
// planted solution of our own). With σ = 0, (x, y) = (t, mt + k): (m, k, α, β, γ) = (1, 1, 0.5, −1, −2).
const quartic = product(linearForm([1, 0.2], 0.3), linearForm([0.5, -1], 2), linearForm([0.1, 0.4], -1), linearForm([1, 1], 0.7));
const contact = sum(product(linearForm([1, 0]), linearForm([1, 0], 0.5)), linearForm([0, 0], -1));
const f = sum(product(linearForm([-1, 1], -1), quartic), product(contact, contact, linearForm([1, 0], -2)));
const coefficients = coefficientsOf(f, exponents, 15);
const unknowns = ['m', 'k', 'alpha', 'beta', 'gamma'].map((n, i) => ops.unknown(n, i));
const equations = bitangentEquations(ops, coefficients.map((c) => ops.constant(c)), exponents, 5, ops.constant(0), { m: unknowns[0]!, k: unknowns[1]!, alpha: unknowns[2]!, beta: unknowns[3]!, residual: [unknowns[4]!] });

describe('the bitangent equations of a plane curve in a line chart', () => {
  it('give one equation per power t⁴ … t⁰ for a quintic', () => {
    expect(equations).toHaveLength(5);
  });

  it.each([
    ['the planted bitangent y = x + 1, crossing at x = 2', [1, 1, 0.5, -1, -2], 'solves'],
    ['the same line with a wrong crossing point', [1, 1, 0.5, -1, -1.9], 'misses'],
    ['a nearby line', [1, 1.05, 0.5, -1, -2], 'misses'],
  ] as const)('%s: %s', (_, point, verdict) => {
    const residual = largestResidual(equations, real(point), []);
    if (verdict === 'solves') expect(residual).toBeLessThan(1e-12);
    else expect(residual).toBeGreaterThan(1e-2);
  });

  it('refuses a degree whose residual unknowns do not match', () => {
    expect(() => bitangentEquations(ops, coefficients.map((c) => ops.constant(c)), exponents, 5, ops.constant(0), { m: unknowns[0]!, k: unknowns[1]!, alpha: unknowns[2]!, beta: unknowns[3]!, residual: [] })).toThrow(/residual unknowns/);
  });

  it.each([
    [0, 1, 0.5, 2, [2, 2.5]],
    [0.5, 1, 0, 2, [1, 3]],
  ] as const)('maps chart σ = %f, (m, k) = (%f, %f), t = %f to the plane point %j', (sigma, m, k, t, expected) => {
    const [x, y] = pointOnChartLine(sigma, m, k, t);
    expect(x).toBeCloseTo(expected[0], 12);
    expect(y).toBeCloseTo(expected[1], 12);
  });
});
