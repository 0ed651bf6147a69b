import { describe, expect, it } from 'vitest';
import { expandEquation } from '../../../generators/pipeline/expand-system.ts';
import { plainDecimal, polynomialText } from '../../../generators/pipeline/polynomial-text.ts';
import { type ExprNode, exprBuilders as ops } from '../../../src/engine/index.ts';

const x = { kind: 'unknown', index: 0, name: 'x' } as const satisfies ExprNode;
const y = { kind: 'unknown', index: 1, name: 'y' } as const satisfies ExprNode;
const p = { kind: 'param', index: 0, name: 'p' } as const satisfies ExprNode;
const text = (node: ExprNode, params: number[] = [0, 0]) => polynomialText(expandEquation(node, 2, Float64Array.from(params)), ['x', 'y']);

describe('expandEquation and polynomialText', () => {
  // Binomial coefficients 1, 3, 3, 1 (Pascal's triangle; common knowledge, no source needed beyond it).
  it('expands (x + y)³ into the binomial coefficients', () => {
    expect(text(ops.pow(ops.add(x, y), 3))).toBe('x^3 + 3*x^2*y + 3*x*y^2 + y^3');
  });
  it('substitutes a complex parameter and writes complex coefficients with I', () => {
    expect(text(ops.sub(ops.mul(p, x, x), ops.mul(p, y)), [2, -0.5])).toBe('(2 - 0.5*I)*x^2 + (-2 + 0.5*I)*y');
    expect(text(ops.mul(p, x), [0, 3])).toBe('3*I*x');
  });
  it('drops terms that cancel exactly and writes the zero polynomial as 0', () => {
    expect(text(ops.sub(ops.mul(x, y), ops.mul(y, x)))).toBe('0');
    expect(text(ops.sub(ops.pow(x, 2), 1))).toBe('x^2 - 1');
    expect(text(ops.neg(ops.pow(y, 2)))).toBe('-y^2');
  });
  it('expands a shared subgraph once and agrees with direct evaluation at a point', () => {
    const s = ops.add(x, ops.mul(2, y), p);
    const node = ops.mul(s, s, ops.sub(s, x));
    const poly = expandEquation(node, 2, Float64Array.from([0.3, 0.1]));
    const [X, Y] = [0.7, -1.1], P = { re: 0.3, im: 0.1 };
    const cx = (re: number, im = 0) => ({ re, im });
    const mul = (a: { re: number; im: number }, b: { re: number; im: number }) => cx(a.re * b.re - a.im * b.im, a.re * b.im + a.im * b.re);
    const sv = cx(X + 2 * Y + P.re, P.im);
    const want = mul(mul(sv, sv), cx(sv.re - X, sv.im));
    let got = cx(0);
    for (const [k, [re, im]] of poly) {
      const [i, j] = k.split(',').map(Number) as [number, number];
      const m = X ** i * Y ** j;
      got = cx(got.re + re * m, got.im + im * m);
    }
    expect(got.re).toBeCloseTo(want.re, 12);
    expect(got.im).toBeCloseTo(want.im, 12);
  });
});

describe('plainDecimal', () => {
  it.each([[1e-7, '0.0000001'], [-2.5e21, '-2500000000000000000000'], [0.1 + 0.2, '0.30000000000000004'], [-0, '0'], [1.5e-10, '0.00000000015'], [123.25, '123.25']])(
    '%d reads %s and round-trips', (v, want) => {
      expect(plainDecimal(v)).toBe(want);
      expect(Number(plainDecimal(v))).toBe(v === 0 ? 0 : v);
    });
});
