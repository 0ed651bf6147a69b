import { describe, expect, it } from 'vitest';
import { kontsevichNumbers } from '../../../../generators/problems/rational-curves/kontsevich-numbers.ts';

describe('Kontsevich’s numbers N_d', () => {
  it('are 1, 1, 12, 620, 87304, 26312976 for d = 1 … 6', () => {
    // Kontsevich–Manin, Gromov–Witten classes, quantum cohomology and enumerative geometry, Comm. Math. Phys. 164 (1994).
    expect(kontsevichNumbers(6)).toEqual([1n, 1n, 12n, 620n, 87304n, 26312976n]);
  });

  it('give N_7 = 14616808192 exactly', () => {
    // From memory (OEIS A013587); the recursion's exact bigint result.
    expect(kontsevichNumbers(7)[6]).toBe(14616808192n);
  });

  it.each([0, -2, 2.5])('refuses the degree %s', (d) => {
    expect(() => kontsevichNumbers(d)).toThrow(RangeError);
  });
});
