import { describe, expect, it } from 'vitest';
import { clipLine, clipPolyline, clipSegment } from '../../src/plots/clip.ts';

const W = { xMin: -1, xMax: 1, yMin: -1, yMax: 1 };

// Expected values are worked by hand from the window's edges (Liang–Barsky 1984 clipping; common practice).
describe('clipSegment', () => {
  it.each([
    ['inside stays whole', [-0.5, 0], [0.5, 0], [[-0.5, 0], [0.5, 0]]],
    ['crossing is cut at both edges', [-3, 0], [3, 0], [[-1, 0], [1, 0]]],
    ['diagonal is cut at the corners', [-2, -2], [2, 2], [[-1, -1], [1, 1]]],
    ['outside is dropped', [2, 2], [3, 3], null],
    ['parallel outside is dropped', [-3, 2], [3, 2], null],
  ] as const)('%s', (_, p, q, want) => {
    const got = clipSegment(p, q, W);
    if (want === null) expect(got).toBeNull();
    else got!.flat().forEach((v, i) => expect(v).toBeCloseTo(want.flat()[i]!, 12));
  });
});

describe('clipLine', () => {
  it('clips y = x to the diagonal of the square', () => {
    const [p, q] = clipLine(1, -1, 0, W)!;
    expect([p, q].map((pt) => pt.map((v) => Math.abs(v)))).toEqual([[1, 1], [1, 1]]);
  });
  it('clips the vertical line x = 0.5 to the window height', () => {
    const [p, q] = clipLine(1, 0, -0.5, W)!;
    expect(p[0]).toBeCloseTo(0.5, 12);
    expect(q[0]).toBeCloseTo(0.5, 12);
    expect(Math.abs(p[1] - q[1])).toBeCloseTo(2, 12);
  });
  it.each([
    ['misses the window', 1, 0, -5],
    ['has no direction (a = b = 0)', 0, 0, 1],
  ])('returns null for a line that %s', (_, a, b, c) => {
    expect(clipLine(a, b, c, W)).toBeNull();
  });
});

describe('clipPolyline', () => {
  it('splits a polyline that leaves and re-enters into two runs', () => {
    const runs = clipPolyline([[-0.5, 0], [0, 3], [0.5, 0]], W);
    expect(runs).toHaveLength(2);
    expect(runs[0]![1]![1]).toBeCloseTo(1, 12);
    expect(runs[1]![0]![1]).toBeCloseTo(1, 12);
  });
  it('keeps a closed curve inside the window as one closed run', () => {
    const square = [[-0.5, -0.5], [0.5, -0.5], [0.5, 0.5], [-0.5, 0.5]] as const;
    const runs = clipPolyline(square, W, true);
    expect(runs).toHaveLength(1);
    expect(runs[0]).toHaveLength(5);
    expect(runs[0]![4]).toEqual(runs[0]![0]);
  });
});
