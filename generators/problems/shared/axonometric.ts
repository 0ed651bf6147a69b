import type { FigureItem } from '../../../src/atlas/figure.ts';

/** Turn about the vertical axis and tilt toward the viewer used for every 3-space figure of this kind (radians). */
const TURN = 0.5, TILT = 0.45;

/**
 * The orthographic image on the drawing plane of a point of 3-space, seen after turning the scene by 0.5 rad about
 * the z-axis and tilting it by 0.45 rad toward the viewer: screen x from the turned x-axis, screen y mixing height z
 * and depth. Exact formulas, no rounding.
 */
export function project(x: number, y: number, z: number): [number, number] {
  const [c, s] = [Math.cos(TURN), Math.sin(TURN)];
  const u = c * x - s * y, depth = s * x + c * y;
  return [u, Math.cos(TILT) * z + Math.sin(TILT) * depth];
}

/** The twelve edges of the cube [−h, h]³ projected, as two-point polylines on the given layer. */
export function cubeEdges(h: number, layer: string, label: string): FigureItem[] {
  const items: FigureItem[] = [];
  const corners = [-h, h];
  for (const axis of [0, 1, 2]) for (const a of corners) for (const b of corners) {
    const end = (t: number): [number, number] => {
      const p = axis === 0 ? [t, a, b] : axis === 1 ? [a, t, b] : [a, b, t];
      return project(p[0]!, p[1]!, p[2]!);
    };
    items.push({ shape: 'polyline', points: [end(-h), end(h)], closed: false, layer, label });
  }
  return items;
}

/** A point of 3-space as a projected point on the solution layer, with a dropped line to the floor z = −h on the 'depth' layer. */
export function pointWithDrop(x: number, y: number, z: number, h: number): FigureItem[] {
  const [sx, sy] = project(x, y, z);
  const [fx, fy] = project(x, y, -h);
  return [{ shape: 'point', x: sx, y: sy, layer: 'solution' }, { shape: 'polyline', points: [[fx, fy], [sx, sy]], closed: false, layer: 'depth' }];
}
