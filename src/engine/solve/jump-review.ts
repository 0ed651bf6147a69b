import type { PathEnd } from '../homotopy.ts';
import { createPointIndex } from '../parameter/point-index.ts';
import type { SystemScaling } from '../start/scaling.ts';
import type { RetrackMode } from './review-ends.ts';

/** Two regular ends closer than this (relative, natural units) are the same point. */
const SAME_POINT = 1e-8;
/**
 * The re-tracks tried in turn on the members of a coincidence: stricterSettings attempts 1 and 2 in double, then 3
 * and 5 with double-double residuals (measured: bitangent instance 1014's path 123 separates only at attempt 5 in
 * double-double; 5 in double still jumps).
 */
const ROUNDS: readonly RetrackMode[] = [{ kind: 'strict', attempt: 1 }, { kind: 'strict', attempt: 2 }, { kind: 'extended', attempt: 3 }, { kind: 'extended', attempt: 5 }];

/**
 * Path-jump recovery (every solve). A nonsingular isolated solution is the end of exactly one path of a generic
 * homotopy, so regular ends that coincide (relative 1e-8 in natural units) mean that a path jumped onto another.
 * Every member of such a coincidence is re-tracked (ROUNDS: stricter steps in double, then in double-double when
 * available) until the ends separate; after each round the coincidences are found
 * again over all ends. `review` re-judges a re-tracked end as the per-path review does. Replaces ends in place, each
 * re-tracked end recording the re-track (PathEnd.retrack, reason 'jump', changed when it left the shared point).
 */
export function recoverJumps(ends: PathEnd[], scaling: SystemScaling, retrack: (path: number, mode: RetrackMode) => PathEnd, review: (end: PathEnd, path: number) => PathEnd, extended: boolean): void {
  const modes = ROUNDS.filter((m) => extended || m.kind === 'strict');
  const shared = new Map<number, Float64Array>();
  let suspects = coinciding(ends, scaling);
  for (const mode of modes) {
    if (suspects.length === 0) break;
    for (const k of suspects) {
      const old = ends[k]!;
      if (!shared.has(k)) shared.set(k, old.point);
      const next = review(retrack(k, mode), k);
      const changed = next.outcome !== 'regular' || distance(next.point, shared.get(k)!, scaling) > SAME_POINT;
      const precision = mode.kind === 'extended' ? 'double-double' : 'double';
      ends[k] = { ...next, steps: old.steps + next.steps, rejectedSteps: old.rejectedSteps + next.rejectedSteps, retries: old.retries + 1 + next.retries, retrack: { reason: 'jump', precision, changed } };
    }
    suspects = coinciding(ends, scaling);
  }
}

/** Indices (ascending) of regular ends that coincide with another regular end, all members of each coincidence. */
export function coinciding(ends: readonly PathEnd[], scaling: SystemScaling): number[] {
  const n = scaling.variables.length;
  const units = scaling.variables.map((c) => 2 ** c);
  const index = createPointIndex(n, SAME_POINT);
  const owner: number[] = [];
  const hit = new Set<number>();
  ends.forEach((e, i) => {
    if (e.outcome !== 'regular') return;
    const y = new Float64Array(2 * n);
    for (let j = 0; j < n; j++) { y[2 * j] = e.point[2 * j]! / units[j]!; y[2 * j + 1] = e.point[2 * j + 1]! / units[j]!; }
    const j = index.find(y);
    if (j < 0) { index.add(y); owner.push(i); return; }
    hit.add(owner[j]!);
    hit.add(i);
  });
  return [...hit].sort((a, b) => a - b);
}

function distance(a: Float64Array, b: Float64Array, scaling: SystemScaling): number {
  let d = 0, s = 0;
  scaling.variables.forEach((c, j) => {
    const u = 2 ** c;
    d = Math.max(d, Math.hypot(a[2 * j]! - b[2 * j]!, a[2 * j + 1]! - b[2 * j + 1]!) / u);
    s = Math.max(s, Math.hypot(a[2 * j]!, a[2 * j + 1]!) / u, Math.hypot(b[2 * j]!, b[2 * j + 1]!) / u);
  });
  return d / (1 + s);
}
