import { describe, expect, it } from 'vitest';
import { roundSignificant } from '../../src/atlas/digits.ts';

describe('rounding to significant digits', () => {
  it.each([
    [Math.PI, 3, 3.14],
    [-0.000123456, 3, -0.000123],
    [123456789, 3, 123000000],
    [1 / 3, 15, 0.333333333333333],
    [-0, 3, 0],
    [42, 15, 42],
  ])('rounds %d to %i digits as %d', (x, digits, expected) => {
    expect(Object.is(roundSignificant(x, digits), expected)).toBe(true);
  });

  it.each([0.1 + 0.2, Math.E * 1e-7, 6.02214076e23, -1.5e-300])('is idempotent on %d', (x) => {
    const once = roundSignificant(x, 15);
    expect(roundSignificant(once, 15)).toBe(once);
  });
});
