import { describe, expect, it } from 'vitest';
import { degree, exprBuilders as ops } from '../../../../src/engine/index.ts';
import { multiply, plus, substitute } from '../../../../generators/problems/shared/univariate.ts';
import { evaluate, real } from './evaluate.ts';

const a = ops.unknown('a', 0), c = ops.unknown('c', 1);

describe('polynomials in an auxiliary variable with expression coefficients', () => {
  it('multiplies and adds, keeping exact zeros out of the graph', () => {
    const p = multiply(ops, [a, c], [null, ops.constant(1)]); // (a + cs)·s = as + cs²
    expect(p[0]).toBeNull();
    expect(evaluate(p[1]!, real([2, 3]), [])).toEqual([2, 0]);
    expect(plus(ops, p, [ops.constant(5)]).map((t) => (t ? evaluate(t, real([2, 3]), [])[0] : null))).toEqual([5, 2, 3]);
  });

  it('substitutes a line into x² − y and collects powers of s with their degrees', () => {
    // x = a + c·s, y = s: (a + cs)² − s = a² + (2ac − 1)s + c²s².
    const inS = substitute(ops, [ops.constant(1), ops.constant(-1)], [[2, 0], [0, 1]], [[a, c], [null, ops.constant(1)]]);
    expect(inS.map((t) => evaluate(t!, real([2, 3]), [])[0])).toEqual([4, 11, 9]);
    expect(inS.map((t) => degree(t!))).toEqual([2, 2, 2]);
  });
});
