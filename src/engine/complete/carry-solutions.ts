import type { CompiledEquations } from '../compile/compile-system.ts';
import { createPointIndex } from '../parameter/point-index.ts';
import { routeThrough, type LegTracker } from '../parameter/route.ts';
import { createRandom } from '../random.ts';
import { compiledLegTracker } from './compiled-leg-tracker.ts';
import { walkLoop } from './loop-walk.ts';

/** What carrying a solution set to new parameters gave: the regular ends (null where every route failed or jumped). */
export interface CarriedSolutions {
  readonly points: readonly (Float64Array | null)[];
  /** Starts whose last route failed, and routes dropped after a jump re-track, over all routes tried. */
  readonly failedPaths: number;
  readonly unresolvedJumps: number;
  readonly paths: number;
  /** Routes tried (1 when the first carried every start). */
  readonly routes: number;
}

/** Routes tried at most: starts whose route failed go again along a route through another random middle point. */
export const CARRY_ROUTES = 3;

/**
 * Carries the solutions at `from` to the parameters `to` by parameter homotopy along two gamma-trick legs through a
 * random complex point (routeThrough, seeded), so that real targets are reached off the real discriminant. Ends that
 * coincide are re-tracked once with safe settings and dropped if they still meet; starts without an end go again along
 * a new route (up to CARRY_ROUTES), and an end already held is dropped (a different route may permute the fibre, so
 * only new points count). Never guesses: what is still missing stays null. The solutions must be distinct and
 * nonsingular at `from`. Deterministic for a seed; in-process unless `track` is given.
 */
export async function carrySolutions(compiled: CompiledEquations, from: Float64Array, to: Float64Array, solutions: readonly Float64Array[], options: { seed: number; track?: LegTracker }): Promise<CarriedSolutions> {
  const track = options.track ?? (await compiledLegTracker(compiled));
  const random = createRandom(options.seed);
  const points: (Float64Array | null)[] = solutions.map(() => null);
  const held = createPointIndex(compiled.n);
  let failedPaths = 0, unresolvedJumps = 0, paths = 0, routes = 0;
  let pending = solutions.map((_, i) => i);
  while (pending.length > 0 && routes < CARRY_ROUTES) {
    routes++;
    const base = createPointIndex(compiled.n);
    for (const i of pending) base.add(solutions[i]!);
    const walk = await walkLoop(track, routeThrough(from, to, random), base, false);
    paths += walk.paths;
    unresolvedJumps += walk.unresolvedJumps;
    const still: number[] = [];
    walk.routes.forEach((r, k) => {
      const i = pending[k]!;
      const end = r.ok ? r.via[r.via.length - 1]! : null;
      if (end === null || held.find(end) >= 0) { still.push(i); return; }
      held.add(end);
      points[i] = end;
    });
    pending = still;
  }
  failedPaths = pending.length;
  return { points, failedPaths, unresolvedJumps, paths, routes };
}
