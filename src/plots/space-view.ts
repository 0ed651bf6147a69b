// Shared by the build and the browser: how a point of 3-space lands on the screen for a given sight.
import type { Sight, SpacePoint } from '../atlas/space-figure.ts';

/** The three unit vectors of a sight in world coordinates: screen right, screen up, and toward the viewer. */
export interface SightBasis {
  readonly across: SpacePoint;
  readonly up: SpacePoint;
  readonly toward: SpacePoint;
}

const RAD = Math.PI / 180;

/**
 * The orthonormal, right-handed basis (across × up = toward) of a sight: the scene is turned by `turn` degrees about
 * the vertical z-axis (counter-clockwise seen from above), then tilted by `tilt` degrees so the viewer looks down on it.
 * At turn 0, tilt 0 the x-axis points right, z up and y away from the viewer. Exact up to the sines and cosines.
 */
export function sightBasis(sight: Sight): SightBasis {
  const c = Math.cos(sight.turn * RAD), s = Math.sin(sight.turn * RAD);
  const ct = Math.cos(sight.tilt * RAD), st = Math.sin(sight.tilt * RAD);
  return { across: [c, -s, 0], up: [st * s, st * c, ct], toward: [-ct * s, -ct * c, st] };
}

/** A point's coordinates in a sight's basis, about a centre: [right, up, toward the viewer] (an orthogonal change, lengths kept). */
export function viewCoordinates(basis: SightBasis, centre: SpacePoint, p: SpacePoint): SpacePoint {
  const d0 = p[0] - centre[0], d1 = p[1] - centre[1], d2 = p[2] - centre[2];
  const dot = (e: SpacePoint) => e[0] * d0 + e[1] * d1 + e[2] * d2;
  return [dot(basis.across), dot(basis.up), dot(basis.toward)];
}

/** Where the drawing sits in its frame: world centre, px per world unit, and the frame's middle in px. */
export interface Placement {
  readonly centre: SpacePoint;
  readonly scale: number;
  readonly middle: readonly [number, number];
}

/**
 * A placement that keeps every point within `reach` px of the frame's middle for every sight: the centre of the
 * points' bounding box and the largest distance from it (a rotation keeps distances). A lone point gets scale 1.
 */
export function placementOf(points: readonly SpacePoint[], width: number, height: number, reach: number): Placement {
  const lo = [Infinity, Infinity, Infinity], hi = [-Infinity, -Infinity, -Infinity];
  for (const p of points) for (let k = 0; k < 3; k++) { lo[k] = Math.min(lo[k]!, p[k]!); hi[k] = Math.max(hi[k]!, p[k]!); }
  const centre: SpacePoint = points.length === 0 ? [0, 0, 0] : [(lo[0]! + hi[0]!) / 2, (lo[1]! + hi[1]!) / 2, (lo[2]! + hi[2]!) / 2];
  const radius = Math.max(0, ...points.map((p) => Math.hypot(p[0] - centre[0], p[1] - centre[1], p[2] - centre[2])));
  return { centre, scale: radius > 0 ? reach / radius : 1, middle: [width / 2, height / 2] };
}

/** Orthographic image of a point in px (y down, as in SVG) and its depth toward the viewer in world units. */
export function toScreen(basis: SightBasis, placement: Placement, p: SpacePoint): [number, number, number] {
  const [u, v, w] = viewCoordinates(basis, placement.centre, p);
  return [placement.middle[0] + placement.scale * u, placement.middle[1] - placement.scale * v, w];
}
