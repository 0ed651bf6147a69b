// Built at site build time: the space figure as the page embeds it, shared by the static SVG and the client.
import { simplifyPolyline } from './simplify-polyline.ts';
import type { Sight, SpaceFigure, SpaceItem, SpacePoint } from '../atlas/space-figure.ts';
import { itemPoints } from './space-pieces.ts';
import { placementOf, type Placement } from './space-view.ts';

/** Everything needed to draw a space figure for any sight: frame size, placement, run length, first sight, items. */
export interface SpacePayload {
  readonly width: number;
  readonly height: number;
  readonly placement: Placement;
  /** Largest distance of a drawn point from the placement's centre (world units). */
  readonly radius: number;
  /** Length of the runs sticks and chains are cut into for depth sorting (world units). */
  readonly piece: number;
  readonly sight: Sight;
  readonly items: SpaceItem[];
}

/** Frame size in px, and the margin kept free around the sphere every sight fits in. */
export const SPACE_WIDTH = 640, SPACE_HEIGHT = 480, SPACE_MARGIN = 16;
/** Simplification tolerance and rounding step, as fractions of the radius (about 0.1 px and 0.02 px on screen). */
const SIMPLIFY = 5e-4, STEP = 1e-4;
/** Runs per radius: pieces are cut to radius / RUNS. */
const RUNS = 8;

/** Perpendicular distance from p to the segment a–b in 3-space. */
function offSegment(p: SpacePoint, a: SpacePoint, b: SpacePoint): number {
  const d = [b[0] - a[0], b[1] - a[1], b[2] - a[2]], e = [p[0] - a[0], p[1] - a[1], p[2] - a[2]];
  const dd = d[0]! ** 2 + d[1]! ** 2 + d[2]! ** 2;
  const t = dd === 0 ? 0 : Math.min(1, Math.max(0, (e[0]! * d[0]! + e[1]! * d[1]! + e[2]! * d[2]!) / dd));
  return Math.hypot(e[0]! - t * d[0]!, e[1]! - t * d[1]!, e[2]! - t * d[2]!);
}

/** Douglas–Peucker in 3-space (simplify-polyline.ts): keeps first, last and every point needed so no dropped point lies farther than `tolerance` from its segment. */
export function simplify3(points: readonly SpacePoint[], tolerance: number): SpacePoint[] {
  return simplifyPolyline(points, tolerance, offSegment);
}

/**
 * The page's copy of a space figure: chains simplified within 5·10⁻⁴ of the radius, every coordinate rounded to the
 * decimal place of 10⁻⁴ of the radius (far below a pixel), placed so every sight fits the frame. Deterministic.
 */
export function spacePayload(figure: SpaceFigure, width = SPACE_WIDTH, height = SPACE_HEIGHT): SpacePayload {
  const reach = Math.min(width, height) / 2 - SPACE_MARGIN;
  const raw = placementOf(figure.items.flatMap(itemPoints), width, height, reach);
  const rawRadius = reach / raw.scale;
  const decimals = Math.max(0, Math.ceil(-Math.log10(rawRadius * STEP)));
  const r = (v: number) => { const x = Number(v.toFixed(decimals)); return x === 0 ? 0 : x; };
  const at = (p: SpacePoint): SpacePoint => [r(p[0]), r(p[1]), r(p[2])];
  const items = figure.items.map((item): SpaceItem => {
    if (item.shape === 'dot') return { ...item, at: at(item.at) };
    if (item.shape === 'stick') return { ...item, from: at(item.from), to: at(item.to) };
    const kept = simplify3(item.points, rawRadius * SIMPLIFY).map(at);
    return { ...item, points: kept.length >= 2 ? kept : [at(item.points[0]!), at(item.points[item.points.length - 1]!)] };
  });
  const placement = placementOf(items.flatMap(itemPoints), width, height, reach);
  const radius = reach / placement.scale;
  return { width, height, placement, radius, piece: radius / RUNS, sight: figure.sight, items };
}
