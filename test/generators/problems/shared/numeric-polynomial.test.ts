import { describe, expect, it } from 'vitest';
import { coefficientsOf, evaluate, linearForm, product } from '../../../../generators/problems/shared/numeric-polynomial.ts';

describe('numeric polynomials for demo data', () => {
  it('expands products of linear forms exactly', () => {
    const p = product(linearForm([1, 0], 1), linearForm([1, 0], -1), linearForm([0, 1], 0)); // (x + 1)(x − 1)y
    expect(coefficientsOf(p, [[2, 1], [0, 1], [1, 1]])).toEqual([1, -1, 0]);
    expect(evaluate(p, [3, 2])).toBe(16);
  });
});
