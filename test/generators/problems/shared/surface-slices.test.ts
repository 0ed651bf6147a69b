import { describe, expect, it } from 'vitest';
import { surfaceSlices } from '../../../../generators/problems/shared/surface-slices.ts';
import { project } from '../../../../generators/problems/shared/axonometric.ts';

describe('horizontal sections of a surface', () => {
  it('draws the unit sphere’s section at height 0.6 as a closed loop of points at radius 0.8, seen through the view', () => {
    const [loop, ...rest] = surfaceSlices((x, y, z) => x * x + y * y + z * z - 1, [0.6], 1.2, 'given', 'sphere', 120);
    expect(rest).toEqual([]);
    const points = (loop as { points: [number, number][] }).points;
    expect(points[0]).toEqual(points.at(-1));
    // Undo the view on the plane z = 0.6: the view is linear, so compare against projected circle points.
    const onCircle = (t: number) => project(0.8 * Math.cos(t), 0.8 * Math.sin(t), 0.6);
    for (const p of points) {
      const nearest = Math.min(...Array.from({ length: 720 }, (_, k) => Math.hypot(...onCircle((k * Math.PI) / 360).map((v, i) => v - p[i]!) as [number, number])));
      expect(nearest).toBeLessThan(0.02); // one grid cell is 0.02
    }
  });

  it('draws nothing at a height the surface misses', () => {
    expect(surfaceSlices((x, y, z) => x * x + y * y + z * z - 1, [1.1], 1.2, 'given', 'sphere')).toEqual([]);
  });
});
