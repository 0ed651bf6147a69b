import { describe, expect, it } from 'vitest';
import { simplifyPolyline } from '../../src/plots/simplify-polyline.ts';

// Douglas–Peucker (Douglas and Peucker, The Canadian Cartographer 10, 1973) on numbers along a line: the offset of p
// from the piece a–b is its distance from the straight interpolation at its own index (worked by hand).
type P = readonly [number, number];
const vertical = (p: P, a: P, b: P): number => Math.abs(p[1] - (a[1] + ((p[0] - a[0]) / (b[0] - a[0])) * (b[1] - a[1])));

describe('simplifyPolyline', () => {
  it.each([
    ['a straight run keeps its ends', [[0, 0], [1, 1], [2, 2], [3, 3]], 1e-9, [[0, 0], [3, 3]]],
    ['a peak above the tolerance is kept, the points on its flanks dropped', [[0, 0], [1, 2.5], [2, 5], [3, 2.5], [4, 0]], 0.5, [[0, 0], [2, 5], [4, 0]]],
    ['a bump below the tolerance is dropped', [[0, 0], [1, 0.2], [2, 0]], 0.5, [[0, 0], [2, 0]]],
    ['two points stay two points', [[0, 0], [1, 9]], 0.5, [[0, 0], [1, 9]]],
    ['one point stays one point', [[4, 4]], 0.5, [[4, 4]]],
  ] as const)('%s', (_, points, tolerance, kept) => {
    expect(simplifyPolyline(points as readonly P[], tolerance, vertical)).toEqual(kept);
  });

  it('never drops a point farther than the tolerance from the kept polyline', () => {
    const points: P[] = Array.from({ length: 200 }, (_, k) => [k, Math.sin(k / 7) * 10]);
    const kept = simplifyPolyline(points, 0.3, vertical);
    for (const p of points) {
      const j = kept.findIndex((q) => q[0] >= p[0]);
      if (kept[j]![0] === p[0]) continue;
      expect(vertical(p, kept[j - 1]!, kept[j]!)).toBeLessThanOrEqual(0.3 + 1e-12);
    }
  });
});
