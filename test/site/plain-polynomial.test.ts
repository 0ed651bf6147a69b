import { describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import { evaluatePlain } from './plain-polynomial.ts';

// Arithmetic checked by hand (common practice, no source).
describe('evaluatePlain (test reader of the plain notation)', () => {
  it.each([
    ['x^2 + y^2 - 4', { x: new Complex(2, 0), y: new Complex(0, 0) }, [0, 0]],
    ['(2 - 0.5*I)*x^2 + (-2 + 0.5*I)*y', { x: new Complex(1, 0), y: new Complex(1, 0) }, [0, 0]],
    ['3*I*x - x*y^3', { x: new Complex(0, 1), y: new Complex(1, 1) }, [-1, 2]],
    ['-y^2', { y: new Complex(0, 1) }, [1, 0]],
  ])('%s', (text, values, [re, im]) => {
    const v = evaluatePlain(text, values);
    expect(v.re).toBeCloseTo(re!, 12);
    expect(v.im).toBeCloseTo(im!, 12);
  });
  it('gives the sum of the terms\' magnitudes as the residual scale', () => {
    // (|3| + |4|·|I|)·|x| + |2|·|y|² = 7·2 + 2·1.
    expect(evaluatePlain('(3 - 4*I)*x - 2*y^2', { x: new Complex(0, 2), y: new Complex(-1, 0) }, true).re).toBeCloseTo(16, 12);
  });
  it('refuses unknown names and stray text', () => {
    expect(() => evaluatePlain('x + z', { x: Complex.ONE })).toThrow(/unknown name z/);
    expect(() => evaluatePlain('x x', { x: Complex.ONE })).toThrow(/unexpected text/);
  });
});
