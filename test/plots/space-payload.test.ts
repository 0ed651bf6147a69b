import { describe, expect, it } from 'vitest';
import { simplify3, spacePayload, SPACE_MARGIN } from '../../src/plots/space-payload.ts';
import type { SpaceFigure, SpacePoint } from '../../src/atlas/space-figure.ts';

const circle = (n: number, r: number, z: number): SpacePoint[] => Array.from({ length: n }, (_, k) => [r * Math.cos((2 * Math.PI * k) / n), r * Math.sin((2 * Math.PI * k) / n), z]);
const off = (p: SpacePoint, chain: readonly SpacePoint[]) => Math.min(...chain.slice(1).map((b, k) => {
  const a = chain[k]!, d = [b[0] - a[0], b[1] - a[1], b[2] - a[2]], e = [p[0] - a[0], p[1] - a[1], p[2] - a[2]];
  const t = Math.min(1, Math.max(0, (e[0]! * d[0]! + e[1]! * d[1]! + e[2]! * d[2]!) / (d[0]! ** 2 + d[1]! ** 2 + d[2]! ** 2)));
  return Math.hypot(e[0]! - t * d[0]!, e[1]! - t * d[1]!, e[2]! - t * d[2]!);
}));

describe('simplify3', () => {
  it.each([[1e-2], [1e-3], [1e-5]])('keeps a sampled circle within %f of the original', (tolerance) => {
    const points = circle(400, 2, 0.5);
    const kept = simplify3(points, tolerance);
    expect(kept[0]).toEqual(points[0]);
    expect(kept.at(-1)).toEqual(points.at(-1));
    for (const p of points) expect(off(p, kept)).toBeLessThanOrEqual(tolerance + 1e-12);
  });

  it('drops the middle points of a straight chain', () => {
    expect(simplify3([[0, 0, 0], [1, 1, 1], [2, 2, 2], [3, 3, 3]], 1e-9)).toEqual([[0, 0, 0], [3, 3, 3]]);
  });
});

describe('spacePayload', () => {
  const figure: SpaceFigure = {
    kind: 'space',
    sight: { turn: 30, tilt: 25 },
    items: [
      { shape: 'chain', points: circle(600, 3, 1), closed: true, layer: 'given' },
      { shape: 'stick', from: [-1.23456789, 0, 0], to: [2, 1.5, -2], layer: 'solution', solution: 0 },
      { shape: 'dot', at: [0.1, 0.2, 0.3], layer: 'solution', solution: 1 },
    ],
  };
  const payload = spacePayload(figure, 640, 480);

  it('fits the sphere of every point into the frame with its margin', () => {
    expect(payload.radius * payload.placement.scale).toBeCloseTo(240 - SPACE_MARGIN, 9);
    expect(payload.piece).toBeCloseTo(payload.radius / 8, 12);
  });

  it('rounds coordinates far below a pixel and shortens long chains', () => {
    const stick = payload.items[1]!;
    expect(stick.shape === 'stick' && Math.abs(stick.from[0] + 1.23456789)).toBeLessThan(payload.radius * 1e-4);
    const chain = payload.items[0]!;
    expect(chain.shape === 'chain' && chain.points.length).toBeLessThan(200);
    expect(payload.sight).toEqual({ turn: 30, tilt: 25 });
  });
});
