import { describe, expect, it } from 'vitest';
import { placementOf, sightBasis, toScreen, viewCoordinates } from '../../src/plots/space-view.ts';
import type { Sight, SpacePoint } from '../../src/atlas/space-figure.ts';

const dot = (a: SpacePoint, b: SpacePoint) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const cross = (a: SpacePoint, b: SpacePoint): SpacePoint => [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]];
const sights: Sight[] = [{ turn: 0, tilt: 0 }, { turn: 35, tilt: 30 }, { turn: -120, tilt: 75 }, { turn: 400, tilt: -45 }, { turn: 90, tilt: 90 }];

describe('sightBasis', () => {
  it.each(sights)('is orthonormal and right-handed at turn $turn°, tilt $tilt°', (sight) => {
    const { across, up, toward } = sightBasis(sight);
    for (const [a, b, want] of [[across, across, 1], [up, up, 1], [toward, toward, 1], [across, up, 0], [across, toward, 0], [up, toward, 0]] as const) {
      expect(dot(a, b)).toBeCloseTo(want, 14);
    }
    cross(across, up).forEach((v, k) => expect(v).toBeCloseTo(toward[k]!, 14));
  });

  // Common practice, no source: the projected images of the unit axes for a turn θ and tilt φ are
  // x ↦ (cos θ, sin φ sin θ), y ↦ (−sin θ, sin φ cos θ), z ↦ (0, cos φ) (screen right, screen up).
  it.each([
    [{ turn: 0, tilt: 0 }, [[1, 0], [0, 0], [0, 1]]],
    [{ turn: 90, tilt: 0 }, [[0, 0], [-1, 0], [0, 1]]],
    [{ turn: 0, tilt: 90 }, [[1, 0], [0, 1], [0, 0]]],
    [{ turn: 30, tilt: 20 }, [[Math.cos(Math.PI / 6), Math.sin(Math.PI / 9) / 2], [-0.5, Math.sin(Math.PI / 9) * Math.cos(Math.PI / 6)], [0, Math.cos(Math.PI / 9)]]],
  ] as const)('projects the unit axes of sight %o to %j', (sight, images) => {
    const b = sightBasis(sight);
    images.forEach(([u, v], k) => {
      expect(b.across[k]).toBeCloseTo(u, 14);
      expect(b.up[k]).toBeCloseTo(v, 14);
    });
  });
});

describe('viewCoordinates', () => {
  const points: SpacePoint[] = [[1, 2, 3], [-4.5, 0.25, 7], [1e3, -2e3, 0.5], [0, 0, 0]];
  it.each(sights)('keeps every distance at turn $turn°, tilt $tilt° (a rotation)', (sight) => {
    const b = sightBasis(sight);
    const centre: SpacePoint = [0.5, -1, 2];
    for (const p of points) for (const q of points) {
      const [a, c] = [viewCoordinates(b, centre, p), viewCoordinates(b, centre, q)];
      const before = Math.hypot(p[0] - q[0], p[1] - q[1], p[2] - q[2]);
      expect(Math.hypot(a[0] - c[0], a[1] - c[1], a[2] - c[2])).toBeCloseTo(before, 9);
    }
  });

  it('sees a point above the centre nearer when looking down, and one behind farther at level sight', () => {
    expect(viewCoordinates(sightBasis({ turn: 0, tilt: 40 }), [0, 0, 0], [0, 0, 1])[2]).toBeGreaterThan(0);
    expect(viewCoordinates(sightBasis({ turn: 0, tilt: 0 }), [0, 0, 0], [0, 1, 0])[2]).toBeCloseTo(-1, 14);
  });
});

describe('placementOf and toScreen', () => {
  const cube: SpacePoint[] = [];
  for (const x of [-1, 3]) for (const y of [0, 2]) for (const z of [-2, 2]) cube.push([x, y, z]);
  it.each(sights)('keeps every corner of a box within the reach of the frame middle at turn $turn°, tilt $tilt°', (sight) => {
    const placement = placementOf(cube, 640, 480, 200);
    expect(placement.centre).toEqual([1, 1, 0]);
    const b = sightBasis(sight);
    const far = Math.max(...cube.map((p) => { const [x, y] = toScreen(b, placement, p); return Math.hypot(x - 320, y - 240); }));
    expect(far).toBeLessThanOrEqual(200 + 1e-9);
  });

  it('puts the centre at the frame middle and screen y downward', () => {
    const placement = placementOf([[0, 0, -1], [0, 0, 1]], 100, 80, 30);
    const b = sightBasis({ turn: 0, tilt: 0 });
    expect(toScreen(b, placement, [0, 0, 0])).toEqual([50, 40, 0]);
    const top = toScreen(b, placement, [0, 0, 1]);
    expect(top[0]).toBeCloseTo(50, 12);
    expect(top[1]).toBeCloseTo(10, 12);
  });
});
