import type { ParameterLeg } from '../parameter/gamma-arc.ts';
import { createPointIndex, type PointIndex } from '../parameter/point-index.ts';
import { randomGamma, type LegTracker } from '../parameter/route.ts';
import type { RandomSource } from '../random.ts';
import type { PathCounts } from './path-counts.ts';

/** One base point's trip around a loop: the regular end of each leg in turn (all three when `ok`). */
export interface LoopRoute {
  /** Ends at the first vertex, the second vertex and back at the base, as far as the route got. */
  readonly via: readonly Float64Array[];
  readonly ok: boolean;
  /** True when the route was dropped because it still met another after the safe re-track. */
  readonly jumped: boolean;
}

/**
 * What one loop did: the routes of every base point (by index in the base set), the points it added, and path counts
 * (failedPaths: routes without a regular end on some leg; jumps: routes whose ends met another's, re-tracked once).
 */
export interface LoopWalk extends PathCounts {
  /** routes[i] is base point i's route; every point of the base set at the end of the walk has one. */
  readonly routes: readonly LoopRoute[];
  /** Indices (in the base set) of the points this loop added. */
  readonly added: readonly number[];
}

/** The three legs base → q1 → q2 → base of a loop, each with its own random gamma. */
export function triangleLegs(base: Float64Array, q1: Float64Array, q2: Float64Array, random: RandomSource): [ParameterLeg, ParameterLeg, ParameterLeg] {
  return [
    { from: base, to: q1, gamma: randomGamma(random) },
    { from: q1, to: q2, gamma: randomGamma(random) },
    { from: q2, to: base, gamma: randomGamma(random) },
  ];
}

/**
 * Sends every point of `base` once around the loop `legs` (base → q1 → q2 → base). Unless `close` is false, an end
 * back at the base that `base` does not hold (relative tolerance, see point-index.ts) is added to it and sent around
 * the same loop too, until the loop adds nothing. Jump check (monodromy permutes the fibre, so two routes may never
 * share an end): routes whose base ends coincide are re-tracked once with safe settings; those still coinciding are
 * dropped (`jumped`). A route that met another at q1 or q2 meets it at the base too, so one check covers all legs.
 */
export async function walkLoop(track: LegTracker, legs: readonly ParameterLeg[], base: PointIndex, close = true, tolerance = 1e-8): Promise<LoopWalk> {
  const routes: LoopRoute[] = [];
  const added: number[] = [];
  let paths = 0, jumps = 0, unresolvedJumps = 0;
  let pending = base.points.map((_, i) => i);
  while (pending.length > 0) {
    const first = await routesOf(track, legs, pending.map((i) => base.points[i]!), false);
    paths += first.paths;
    pending.forEach((i, k) => { routes[i] = first.routes[k]!; });
    const suspects = coincidentRoutes(routes, tolerance);
    if (suspects.length > 0) {
      jumps += suspects.length;
      const again = await routesOf(track, legs, suspects.map((i) => base.points[i]!), true);
      paths += again.paths;
      suspects.forEach((i, k) => { routes[i] = again.routes[k]!; });
      for (const i of coincidentRoutes(routes, tolerance)) {
        routes[i] = { ...routes[i]!, ok: false, jumped: true };
        unresolvedJumps++;
      }
    }
    const touched = [...new Set([...pending, ...suspects])];
    pending = [];
    if (!close) continue;
    for (const i of touched) {
      const r = routes[i]!;
      if (!r.ok) continue;
      const end = r.via[r.via.length - 1]!;
      if (base.find(end) >= 0) continue;
      const j = base.add(end);
      added.push(j);
      pending.push(j);
    }
  }
  const failedPaths = routes.filter((r) => !r.ok && !r.jumped).length;
  return { routes, added, paths, failedPaths, jumps, unresolvedJumps };
}

/** Tracks the starts along the legs in turn, keeping each leg's regular end; a route stops at its first non-regular end. */
async function routesOf(track: LegTracker, legs: readonly ParameterLeg[], starts: readonly Float64Array[], safe: boolean): Promise<{ routes: LoopRoute[]; paths: number }> {
  const via: Float64Array[][] = starts.map(() => []);
  const ok = starts.map(() => true);
  let live = starts.map((_, i) => i), points = starts.slice(), paths = 0;
  for (const leg of legs) {
    if (live.length === 0) break;
    const ends = await track(leg, points, safe);
    paths += points.length;
    const next: number[] = [];
    ends.forEach((e, k) => {
      const i = live[k]!;
      if (e.outcome === 'regular') { via[i]!.push(e.point); next.push(i); } else ok[i] = false;
    });
    live = next;
    points = next.map((i) => via[i]![via[i]!.length - 1]!);
  }
  return { routes: starts.map((_, i) => ({ via: via[i]!, ok: ok[i]!, jumped: false })), paths };
}

/** Indices of complete routes whose final ends coincide with another complete route's (every member of each coincidence). */
function coincidentRoutes(routes: readonly (LoopRoute | undefined)[], tolerance: number): number[] {
  const done = routes.map((r, i) => (r?.ok ? i : -1)).filter((i) => i >= 0);
  if (done.length === 0) return [];
  const last = (r: LoopRoute): Float64Array => r.via[r.via.length - 1]!;
  const index = createPointIndex(last(routes[done[0]!]!).length / 2, tolerance);
  const owner: number[] = [];
  const hit = new Set<number>();
  for (const i of done) {
    const end = last(routes[i]!);
    const j = index.find(end);
    if (j < 0) { index.add(end); owner.push(i); continue; }
    hit.add(owner[j]!); hit.add(i);
  }
  return [...hit].sort((a, b) => a - b);
}
