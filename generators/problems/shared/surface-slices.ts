import type { FigureItem } from '../../../src/atlas/figure.ts';
import { sampleCurve } from './contour.ts';
import { project } from './axonometric.ts';

/**
 * The horizontal sections z = const of the surface g(x, y, z) = 0 at the given heights inside the cube [−h, h]³,
 * each sampled by marching squares (accuracy about one cell) and drawn through the fixed orthographic view as
 * polylines on the given layer. For drawing only.
 */
export function surfaceSlices(g: (x: number, y: number, z: number) => number, heights: readonly number[], h: number, layer: string, label: string, cells = 90): FigureItem[] {
  return heights.flatMap((z) =>
    sampleCurve((x, y) => g(x, y, z), { xMin: -h, xMax: h, yMin: -h, yMax: h }, cells).map((line) => ({
      shape: 'polyline' as const,
      points: line.map(([x, y]) => project(x, y, z)),
      closed: false,
      layer,
      label,
    })),
  );
}
