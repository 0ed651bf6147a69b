import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/bitangents-of-a-plane-quartic.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { monomialExponents } from '../../../../generators/problems/shared/monomials.ts';
import { coefficientsOf, linearForm, product, sum } from '../../../../generators/problems/shared/numeric-polynomial.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';

const system = systemOf(definition);

describe('bitangents of a plane quartic: the formulation', () => {
  it('is satisfied by a planted bitangent y = x + 1 touching where x² + 0.5x − 1 = 0', () => {
    // f = (y − x − 1)·h + (x² + 0.5x − 1)², with h an arbitrary cubic: on the line, f is a square.
    const cubic = sum(product(linearForm([1, 0.2], 0.3), linearForm([0.5, -1], 2), linearForm([0.1, 0.4], -1)));
    const square = product(sum(product(linearForm([1, 0], 0), linearForm([1, 0], 0.5)), linearForm([0, 0], -1)), sum(product(linearForm([1, 0], 0), linearForm([1, 0], 0.5)), linearForm([0, 0], -1)));
    const f = sum(product(linearForm([-1, 1], -1), cubic), square);
    const q = Object.fromEntries(system.parameters.map((n, m) => [n, coefficientsOf(f, monomialExponents(2, 4))[m]!]));
    const params = paramsFrom(system.parameters, q);
    expect(largestResidual(system.equations, real([1, 1, 0.5, -1]), params)).toBeLessThan(1e-9);
    expect(largestResidual(system.equations, real([1, 1.1, 0.5, -1]), params)).toBeGreaterThan(1e-3);
  });

  it('draws a real bitangent with its two points of contact', () => {
    const items = definition.drawing!.solution([1, 1, 0.5, -1], {});
    expect(items.map((i) => i.layer).sort()).toEqual(['solution', 'tangency', 'tangency']);
  });
});
