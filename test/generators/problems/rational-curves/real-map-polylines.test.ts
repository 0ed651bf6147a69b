import { describe, expect, it } from 'vitest';
import { realMapCoefficients, realMapPolylines, type RealMapCoefficients } from '../../../../generators/problems/rational-curves/real-map-polylines.ts';

const window = { xMin: -2, xMax: 2, yMin: -2, yMax: 2 };

describe('polylines of a real parametrised curve', () => {
  it('draws the unit circle (s² − t², 2st, s² + t²) as one closed run on the circle', () => {
    // The rational parametrisation of the circle (common practice, no source).
    const circle: RealMapCoefficients = [[1, 0, 1], [0, 2, 0], [-1, 0, 1]];
    const runs = realMapPolylines(circle, window);
    expect(runs).toHaveLength(1);
    const run = runs[0]!;
    run.forEach(([x, y]) => expect(Math.abs(Math.hypot(x, y) - 1)).toBeLessThan(1e-4));
    expect(Math.hypot(run[0]![0] - run.at(-1)![0], run[0]![1] - run.at(-1)![1])).toBeLessThan(1e-9);
    const gaps = run.slice(1).map(([x, y], k) => Math.hypot(x - run[k]![0], y - run[k]![1]));
    expect(Math.max(...gaps)).toBeLessThan(0.5);
  });

  it('draws the parabola (st, t², s²) only inside the widened window and breaks it where it leaves', () => {
    const parabola: RealMapCoefficients = [[0, 0, 1], [1, 0, 0], [0, 1, 0]];
    const runs = realMapPolylines(parabola, window);
    expect(runs).toHaveLength(1);
    runs[0]!.forEach(([x, y]) => {
      expect(Math.abs(y - x * x)).toBeLessThan(1e-3);
      expect(y).toBeLessThanOrEqual(2.2);
    });
  });

  it('builds the degree-4 map of the page from its unknowns: φ(0) = P₁, φ(1) = μP₂, φ(∞) = λP₃', () => {
    const q = { px1: 1, py1: 2, px2: -1, py2: 0.5, px3: 3, py3: -2 };
    const values = [2, 0.5, 0.1, 0.2, 0.3, -0.4, 0.5, -0.6];
    const a = realMapCoefficients(4, values, q);
    expect(a[0]).toEqual([1, 2, 1]);
    expect(a[4]).toEqual([6, -4, 2]);
    const sum = [0, 1, 2].map((k) => a.reduce((s, c) => s + c[k]!, 0));
    [-0.5, 0.25, 0.5].forEach((v, k) => expect(sum[k]).toBeCloseTo(v, 12));
  });
});
