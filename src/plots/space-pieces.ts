// Shared by the build and the browser: a space figure cut into short pieces and sorted for painting far to near.
import type { Sight, SpaceItem, SpacePoint } from '../atlas/space-figure.ts';
import { sightBasis, toScreen, type Placement } from './space-view.ts';

/** One drawn piece in px (y down): a dot (one point) or a short run of a stick or chain, with its item's tags and its depth. */
export interface SpacePiece {
  readonly kind: SpaceItem['shape'];
  /** Index of the item in the figure. */
  readonly item: number;
  readonly layer: string;
  readonly solution: number | null;
  readonly label: string | null;
  readonly points: readonly (readonly [number, number])[];
  /** Mean distance toward the viewer from the placement's centre, world units (larger is nearer). */
  readonly depth: number;
}

const dist = (a: SpacePoint, b: SpacePoint) => Math.hypot(a[0] - b[0], a[1] - b[1], a[2] - b[2]);
const lerp = (a: SpacePoint, b: SpacePoint, t: number): SpacePoint => [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t, a[2] + (b[2] - a[2]) * t];

/**
 * The runs of a polyline of 3-space each about `length` long (world units): chords longer than `length` are first cut
 * evenly, then consecutive points are gathered until a run reaches `length`. Neighbouring runs share their end point;
 * a polyline shorter than `length` is one run. Exact (only linear interpolation).
 */
export function cutRuns(points: readonly SpacePoint[], length: number): SpacePoint[][] {
  const dense: SpacePoint[] = points.length > 0 ? [points[0]!] : [];
  for (let k = 1; k < points.length; k++) {
    const a = points[k - 1]!, b = points[k]!, n = Math.max(1, Math.ceil(dist(a, b) / length));
    for (let j = 1; j <= n; j++) dense.push(j === n ? b : lerp(a, b, j / n));
  }
  const runs: SpacePoint[][] = [];
  let run: SpacePoint[] = dense.slice(0, 1), travelled = 0;
  for (let k = 1; k < dense.length; k++) {
    run.push(dense[k]!);
    travelled += dist(dense[k - 1]!, dense[k]!);
    if (travelled >= length * (1 - 1e-9) && k < dense.length - 1) { runs.push(run); run = [dense[k]!]; travelled = 0; }
  }
  if (run.length > 1) runs.push(run);
  return runs;
}

/** The points of an item in 3-space (a chain closed back to its start when `closed`). */
export function itemPoints(item: SpaceItem): SpacePoint[] {
  if (item.shape === 'dot') return [item.at];
  if (item.shape === 'stick') return [item.from, item.to];
  return item.closed ? [...item.points, item.points[0]!] : [...item.points];
}

const round2 = (v: number) => Math.round(v * 100) / 100;

/**
 * The figure for one sight as pieces sorted far to near (painter's order; ties keep figure order): sticks and chains
 * cut into runs about `length` long so that crossing items overlap correctly, dots whole. Items on a layer in `hidden`
 * are left out. Screen points rounded to 0.01 px; deterministic for given inputs.
 */
export function spacePieces(items: readonly SpaceItem[], sight: Sight, placement: Placement, length: number, hidden: ReadonlySet<string> = new Set()): SpacePiece[] {
  const basis = sightBasis(sight);
  const pieces: SpacePiece[] = [];
  items.forEach((item, index) => {
    if (hidden.has(item.layer)) return;
    const tags = { kind: item.shape, item: index, layer: item.layer, solution: item.solution ?? null, label: item.label ?? null };
    const runs = item.shape === 'dot' ? [[item.at]] : cutRuns(itemPoints(item), length);
    for (const run of runs) {
      const screen = run.map((p) => toScreen(basis, placement, p));
      pieces.push({ ...tags, points: screen.map(([x, y]) => [round2(x), round2(y)] as const), depth: screen.reduce((s, p) => s + p[2], 0) / screen.length });
    }
  });
  return pieces.map((p, order) => ({ p, order })).sort((a, b) => a.p.depth - b.p.depth || a.order - b.order).map(({ p }) => p);
}
