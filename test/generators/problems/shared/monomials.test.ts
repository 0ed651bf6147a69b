import { describe, expect, it } from 'vitest';
import { coefficientNames, monomialExponents } from '../../../../generators/problems/shared/monomials.ts';

describe('monomial order and coefficient names', () => {
  it('lists monomials highest degree first and names coefficients by exponents', () => {
    expect(monomialExponents(2, 2)).toEqual([[2, 0], [1, 1], [0, 2], [1, 0], [0, 1], [0, 0]]);
    expect(coefficientNames('c', 2, 1)).toEqual(['c10', 'c01', 'c00']);
    expect(monomialExponents(3, 3)).toHaveLength(20);
    expect(monomialExponents(2, 4)).toHaveLength(15);
  });
});
