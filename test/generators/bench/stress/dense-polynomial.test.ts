import { describe, expect, it } from 'vitest';
import { coefficientSource } from '../../../../generators/bench/stress/coefficient-source.ts';
import { densePolynomial } from '../../../../generators/bench/stress/dense-polynomial.ts';
import { degree, exprBuilders } from '../../../../src/engine/index.ts';
import { evaluate, type C } from '../../problems/shared/evaluate.ts';

const { unknown } = exprBuilders;

const vars = (n: number) => Array.from({ length: n }, (_, j) => unknown(`x${j + 1}`, j));

describe('a dense random polynomial', () => {
  // C(n + d, d) monomials of degree ≤ d in n unknowns (stars and bars)
  it.each([[3, 6, 84], [4, 4, 70], [5, 3, 56], [10, 2, 66]])('in %i unknowns of degree %i has one coefficient for each of its %i monomials', (n, d, monomials) => {
    const source = coefficientSource(1);
    const f = densePolynomial(vars(n), d, source);
    expect(source.names()).toHaveLength(monomials);
    expect(degree(f)).toBe(d);
  });

  it('is Σ c_α x^α: at x = (2, 3) the quadric is c0·4 + c1·6 + c2·9 + c3·2 + c4·3 + c5', () => {
    const source = coefficientSource(2);
    const f = densePolynomial(vars(2), 2, source);
    const v = source.values();
    const c: C[] = Array.from({ length: 6 }, (_, k) => [v[2 * k]!, v[2 * k + 1]!]);
    const weights = [4, 6, 9, 2, 3, 1];
    const [re, im] = evaluate(f, [[2, 0], [3, 0]], c);
    expect(re).toBeCloseTo(weights.reduce((s, w, k) => s + w * c[k]![0], 0), 12);
    expect(im).toBeCloseTo(weights.reduce((s, w, k) => s + w * c[k]![1], 0), 12);
  });
});
