import { describe, expect, it } from 'vitest';
import { binomial } from '../../../../generators/problems/shared/binomial.ts';

describe('binomial', () => {
  it.each([
    // Pascal's triangle, common practice, no source.
    [0, 0, 1n], [5, 2, 10n], [10, 5, 252n], [11, 0, 1n], [11, 11, 1n],
    [60, 30, 118264581564861424n],
    [4, -1, 0n], [4, 5, 0n],
  ])('C(%i, %i) = %s', (n, k, value) => {
    expect(binomial(n, k)).toBe(value);
  });

  it('satisfies Pascal’s rule exactly', () => {
    for (let n = 1; n < 40; n++) for (let k = 1; k < n; k++) expect(binomial(n, k)).toBe(binomial(n - 1, k - 1) + binomial(n - 1, k));
  });
});
