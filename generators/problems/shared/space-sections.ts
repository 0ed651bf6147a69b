import type { SpaceItem } from '../../../src/atlas/space-figure.ts';
import { sampleCurve } from './contour.ts';

/**
 * The horizontal sections z = const of the surface g(x, y, z) = 0 at the given heights inside the cube [−h, h]³,
 * each sampled by marching squares (accuracy about one cell) as chains of 3-space on the given layer. For drawing only.
 */
export function spaceSections(g: (x: number, y: number, z: number) => number, heights: readonly number[], h: number, layer: string, label: string, cells = 90): SpaceItem[] {
  return heights.flatMap((z) =>
    sampleCurve((x, y) => g(x, y, z), { xMin: -h, xMax: h, yMin: -h, yMax: h }, cells).map((line): SpaceItem => ({
      shape: 'chain',
      points: line.map(([x, y]) => [x, y, z] as [number, number, number]),
      closed: false,
      layer,
      label,
    })),
  );
}
