import type { PathEnd } from '../homotopy.ts';
import type { ParameterLeg } from './gamma-arc.ts';
import { createPointIndex } from './point-index.ts';
import type { LegTracker } from './route.ts';

/** Ends of whole routes, and how many starts were re-tracked because two of them landed on one end. */
export interface RouteResult {
  readonly ends: PathEnd[];
  /** Starts re-tracked with safe settings because their ends coincided with another's. */
  readonly jumpRetracks: number;
  /** Regular ends that still coincide with an earlier end after the safe re-track. */
  readonly duplicates: number;
}

/**
 * Tracks every start along the legs in turn (a path that does not end a leg 'regular' stops there, keeping its
 * outcome); steps, rejections and retries are summed over the legs. Then the jump check: starts whose final ends
 * coincide (relative tolerance) are re-tracked once with safe settings, and remaining coincidences are counted.
 */
export async function trackRoute(track: LegTracker, legs: readonly ParameterLeg[], starts: readonly Float64Array[], tolerance = 1e-8): Promise<RouteResult> {
  const ends = await alongLegs(track, legs, starts, false);
  const suspects = coincident(ends, tolerance);
  if (suspects.length > 0) {
    const again = await alongLegs(track, legs, suspects.map((i) => starts[i]!), true);
    suspects.forEach((i, k) => {
      const e = again[k]!, old = ends[i]!;
      ends[i] = { ...e, steps: e.steps + old.steps, rejectedSteps: e.rejectedSteps + old.rejectedSteps, retries: e.retries + old.retries + 1 };
    });
  }
  return { ends, jumpRetracks: suspects.length, duplicates: duplicateCount(ends, tolerance) };
}

async function alongLegs(track: LegTracker, legs: readonly ParameterLeg[], starts: readonly Float64Array[], safe: boolean): Promise<PathEnd[]> {
  const ends: PathEnd[] = new Array(starts.length);
  let live = starts.map((_, i) => i);
  let points = starts.slice();
  for (const leg of legs) {
    const out = await track(leg, points, safe);
    const next: number[] = [];
    out.forEach((e, k) => {
      const i = live[k]!, before = ends[i];
      ends[i] = before === undefined ? e : { ...e, steps: e.steps + before.steps, rejectedSteps: e.rejectedSteps + before.rejectedSteps, retries: e.retries + before.retries };
      if (e.outcome === 'regular') next.push(i);
    });
    live = next;
    points = next.map((i) => ends[i]!.point);
  }
  return ends;
}

/** Indices of regular ends that coincide with another regular end (all members of each coincidence). */
export function coincident(ends: readonly PathEnd[], tolerance: number): number[] {
  const n = ends.find((e) => e.outcome === 'regular')?.point.length ?? 0;
  const index = createPointIndex(n / 2, tolerance);
  const owner: number[] = [];
  const hit = new Set<number>();
  ends.forEach((e, i) => {
    if (e.outcome !== 'regular') return;
    const j = index.find(e.point);
    if (j < 0) { index.add(e.point); owner.push(i); return; }
    hit.add(owner[j]!); hit.add(i);
  });
  return [...hit].sort((a, b) => a - b);
}

/** Regular ends minus distinct regular ends. */
export function duplicateCount(ends: readonly PathEnd[], tolerance = 1e-8): number {
  const regular = ends.filter((e) => e.outcome === 'regular');
  if (regular.length === 0) return 0;
  const index = createPointIndex(regular[0]!.point.length / 2, tolerance);
  let extra = 0;
  for (const e of regular) {
    if (index.find(e.point) >= 0) extra++;
    else index.add(e.point);
  }
  return extra;
}
