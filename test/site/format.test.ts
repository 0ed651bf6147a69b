import { describe, expect, it } from 'vitest';
import { formatComplex, formatCondition, formatCount, formatNumber, formatResidual } from '../../src/site/format.ts';

// Display conventions are our own (common practice, no source): fixed significant digits, Unicode minus.
describe('formatNumber', () => {
  it.each([
    [0, '0'],
    [-0, '0'],
    [1.5, '1.5'],
    [-2.25, '−2.25'],
    [1 / 3, '0.333333'],
    [123456.7, '123457'],
    [1e6, '1e6'],
    [-2.5e-7, '−2.5e−7'],
    [Number.POSITIVE_INFINITY, '∞'],
    [Number.NaN, 'NaN'],
    [-1e-13, '−1e−13'],
  ])('formats %d as %s', (v, want) => expect(formatNumber(v)).toBe(want));
  it('rounds to the requested significant digits', () => expect(formatNumber(Math.PI, 3)).toBe('3.14'));
});

describe('formatComplex', () => {
  it.each([
    [[1, 0], '1'],
    [[1, 1e-15], '1'],
    [[0, 1], 'i'],
    [[0, -2], '−2i'],
    [[1.5, -0.25], '1.5 − 0.25i'],
    [[-1, 2], '−1 + 2i'],
  ] as const)('formats %j as %s', (v, want) => expect(formatComplex(v)).toBe(want));
});

describe('residual, condition and counts', () => {
  it.each([[5.07e-16, '5.1e−16'], [0, '0'], [0.5, '5.0e−1']])('residual %d reads %s', (v, want) => expect(formatResidual(v)).toBe(want));
  it('shows a singular Jacobian as infinite condition', () => expect(formatCondition(null)).toBe('∞ (singular)'));
  it('shows a condition to 3 digits', () => expect(formatCondition(3.14159)).toBe('3.14'));
  it('groups thousands and names an unknown count', () => {
    expect(formatCount(3264)).toBe('3,264');
    expect(formatCount(null)).toBe('unknown');
  });
});
