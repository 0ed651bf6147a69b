import { describe, expect, it } from 'vitest';
import { cubicAt, fitCubics, hermiteCubic, insideIntervals, type ParametricCurve } from '../../src/plots/cubic-fit.ts';

const circle = (r: number): ParametricCurve => ({ at: (t) => [r * Math.cos(t), r * Math.sin(t)], velocity: (t) => [-r * Math.sin(t), r * Math.cos(t)] });
const parabola: ParametricCurve = { at: (s) => [s, s * s], velocity: (s) => [1, 2 * s] };

/** Largest distance from the fitted cubics to the curve, measured as the distance from dense cubic points to the circle. */
function circleError(r: number, tolerance: number): { error: number; segments: number } {
  const cubics = fitCubics(circle(r), 0, 2 * Math.PI, tolerance);
  let error = 0;
  for (const c of cubics) for (let k = 0; k <= 32; k++) error = Math.max(error, Math.abs(Math.hypot(...cubicAt(c, k / 32)) - r));
  return { error, segments: cubics.length };
}

describe('fitCubics', () => {
  it.each([[10, 0.02], [300, 0.02], [300, 0.001], [5000, 0.02]])('keeps a circle of radius %d px within %d px (measured densely)', (r, tol) => {
    const { error, segments } = circleError(r, tol);
    expect(error).toBeLessThanOrEqual(tol);
    expect(segments).toBeLessThanOrEqual(64);
  });

  it('needs few segments: a radius-300 px circle within 0.02 px takes at most 16 cubics', () => {
    expect(circleError(300, 0.02).segments).toBeLessThanOrEqual(16);
  });

  it('reproduces a parabola exactly (a Hermite cubic interpolates a quadratic curve)', () => {
    const cubics = fitCubics(parabola, -3, 3, 1e-9, 1);
    expect(cubics).toHaveLength(1);
    for (let k = 0; k <= 10; k++) {
      const [x, y] = cubicAt(cubics[0]!, k / 10);
      expect(y).toBeCloseTo(x * x, 12);
    }
  });

  it('joins consecutive segments end to start, and starts and ends on the curve', () => {
    const cubics = fitCubics(circle(50), 0.3, 2.9, 0.01);
    for (let k = 1; k < cubics.length; k++) expect(cubics[k]![0]).toEqual(cubics[k - 1]![3]);
    expect(cubics[0]![0]).toEqual(circle(50).at(0.3));
    expect(cubics.at(-1)![3]).toEqual(circle(50).at(2.9));
  });

  it('rejects an empty interval or a non-positive tolerance', () => {
    expect(() => fitCubics(parabola, 1, 1, 0.1)).toThrow(/t0 < t1/);
    expect(() => fitCubics(parabola, 0, 1, 0)).toThrow(/tolerance/);
  });
});

describe('hermiteCubic', () => {
  it('puts the control points a third of the step along the end velocities', () => {
    expect(hermiteCubic(parabola, 0, 3)).toEqual([[0, 0], [1, 0], [2, 3], [3, 9]]);
  });
});

describe('insideIntervals', () => {
  const rect = { xMin: -1, xMax: 1, yMin: -1, yMax: 1 };
  it('finds where y = x² is inside the square: |x| ≤ 1, refined to the crossing', () => {
    const [only, ...rest] = insideIntervals(parabola.at, -3, 3, rect, false);
    expect(rest).toEqual([]);
    expect(only![0]).toBeCloseTo(-1, 9);
    expect(only![1]).toBeCloseTo(1, 9);
  });
  it('returns the whole range for a closed curve wholly inside', () => {
    expect(insideIntervals(circle(0.5).at, 0, 2 * Math.PI, rect, true)).toEqual([[0, 2 * Math.PI]]);
  });
  it('joins the run of a closed curve that passes through its start into one run ending past t1', () => {
    // (0.5 cos t, 1.5 sin t) is inside the square near t = 0 and t = π, outside near ±π/2: two runs, not three.
    const tall = (t: number) => [0.5 * Math.cos(t), 1.5 * Math.sin(t)] as const;
    const runs = insideIntervals(tall, 0, 2 * Math.PI, rect, true);
    const a = Math.asin(1 / 1.5);
    expect(runs).toHaveLength(2);
    expect(runs[0]![0]).toBeCloseTo(Math.PI - a, 9);
    expect(runs[0]![1]).toBeCloseTo(Math.PI + a, 9);
    expect(runs[1]![0]).toBeCloseTo(2 * Math.PI - a, 9);
    expect(runs[1]![1]).toBeCloseTo(2 * Math.PI + a, 9);
  });
  it('gives nothing for a curve wholly outside', () => {
    expect(insideIntervals(circle(5).at, 0, 2 * Math.PI, rect, true)).toEqual([]);
  });
});
