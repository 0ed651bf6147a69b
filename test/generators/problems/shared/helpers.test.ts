import { describe, expect, it } from 'vitest';
import { sampleCurve } from '../../../../generators/problems/shared/contour.ts';
import { fitWindow } from '../../../../generators/problems/shared/fit-window.ts';
import { clipLine } from '../../../../generators/problems/shared/segment.ts';
import { normalizeByLargest } from '../../../../generators/problems/shared/normalize.ts';
import { coefficientNames, monomialExponents } from '../../../../generators/problems/shared/monomials.ts';
import { coefficientsOf, evaluate, linearForm, product } from '../../../../generators/problems/shared/numeric-polynomial.ts';

describe('drawing and data helpers of the problem definitions', () => {
  it('samples the unit circle as one closed polyline within a cell of radius 1', () => {
    const w = { xMin: -2, xMax: 2, yMin: -2, yMax: 2 };
    const lines = sampleCurve((x, y) => x * x + y * y - 1, w, 80);
    expect(lines).toHaveLength(1);
    const [first, last] = [lines[0]![0]!, lines[0]!.at(-1)!];
    expect(first).toEqual(last);
    for (const [x, y] of lines[0]!) expect(Math.abs(Math.hypot(x, y) - 1)).toBeLessThan(4 / 80);
  });

  it('samples a hyperbola as two open branches', () => {
    const lines = sampleCurve((x, y) => x * y - 0.5, { xMin: -2, xMax: 2, yMin: -2, yMax: 2 }, 64);
    expect(lines).toHaveLength(2);
    for (const l of lines) expect(l[0]).not.toEqual(l.at(-1));
  });

  it('fits a window around circles, points, ellipses and line crossings', () => {
    const w = fitWindow([
      { shape: 'circle', cx: 0, cy: 0, r: 1, layer: 'given' },
      { shape: 'conic', coefficients: [1 / 9, 0, 1, -2 / 3, 0, 0], layer: 'solution' }, // (x − 3)²/9 + y² = 1: x ∈ [0, 6]
      { shape: 'line', a: 1, b: 0, c: 2, layer: 'given' },
      { shape: 'line', a: 0, b: 1, c: 3, layer: 'given' }, // crossing (−2, −3)
    ], 0);
    expect(w.xMin).toBeCloseTo(-2, 9);
    expect(w.xMax).toBeCloseTo(6, 9);
    expect(w.yMin).toBeCloseTo(-3, 9);
    expect(w.yMax).toBeCloseTo(1, 9);
  });

  it('clips a line to a window and reports a miss', () => {
    const w = { xMin: 0, xMax: 1, yMin: 0, yMax: 1 };
    const seg = clipLine(0, 0, 1, 1, w)!;
    expect(seg[0][0]).toBeCloseTo(0, 12);
    expect(seg[1][1]).toBeCloseTo(1, 12);
    expect(clipLine(0, 5, 1, 0, w)).toBeNull();
  });

  it('scales projective coordinates of a real point, given with a complex factor, back to real values', () => {
    const out = normalizeByLargest(new Float64Array([1, 1, -4, -4, 2, 2])); // (1, −4, 2)·(1 + i)
    expect([...out].map((v) => Number(v.toFixed(12)))).toEqual([-0.25, 0, 1, 0, -0.5, 0]);
  });

  it('lists monomials highest degree first and names coefficients by exponents', () => {
    expect(monomialExponents(2, 2)).toEqual([[2, 0], [1, 1], [0, 2], [1, 0], [0, 1], [0, 0]]);
    expect(coefficientNames('c', 2, 1)).toEqual(['c10', 'c01', 'c00']);
    expect(monomialExponents(3, 3)).toHaveLength(20);
    expect(monomialExponents(2, 4)).toHaveLength(15);
  });

  it('expands products of linear forms exactly', () => {
    const p = product(linearForm([1, 0], 1), linearForm([1, 0], -1), linearForm([0, 1], 0)); // (x + 1)(x − 1)y
    expect(coefficientsOf(p, [[2, 1], [0, 1], [1, 1]])).toEqual([1, -1, 0]);
    expect(evaluate(p, [3, 2])).toBe(16);
  });
});
