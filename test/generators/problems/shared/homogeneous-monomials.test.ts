import { describe, expect, it } from 'vitest';
import { homogeneousExponents, homogeneousNames } from '../../../../generators/problems/shared/homogeneous-monomials.ts';

// The number of monomials of degree d in n variables is C(n + d − 1, d) (stars and bars; common practice, no source).
describe('homogeneous monomials', () => {
  it.each([[3, 3, 10], [4, 3, 20], [5, 5, 126], [2, 7, 8]])('in %i variables of degree %i there are %i', (n, d, count) => {
    const exponents = homogeneousExponents(n, d);
    expect(exponents).toHaveLength(count);
    expect(new Set(exponents.map((e) => e.join(','))).size).toBe(count);
    for (const e of exponents) expect(e.reduce((s, k) => s + k, 0)).toBe(d);
  });

  it('starts with the pure power of the first variable and names each coefficient by its exponent digits', () => {
    expect(homogeneousExponents(5, 5)[0]).toEqual([5, 0, 0, 0, 0]);
    expect(homogeneousNames('c', 5, 5).slice(0, 2)).toEqual(['c50000', 'c41000']);
    expect(homogeneousNames('c', 5, 5).at(-1)).toBe('c00005');
  });
});
