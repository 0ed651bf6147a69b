import type { PathEnd } from '../homotopy.ts';
import type { ParameterLeg } from './gamma-arc.ts';
import { createModuleLegTracker, type HomotopyModuleRef } from './module-tracker.ts';
import { createPointIndex } from './point-index.ts';
import type { LegTracker } from './route.ts';
import { trackRoute } from './track-route.ts';

/**
 * Other coordinate charts of the same working system. A path that fails because its solution passes near a chart's
 * hyperplane at infinity (large coordinates, step underflow) follows the same geometric solution curve in another
 * chart, so re-tracking it there reaches the very end it was heading for.
 */
export interface AlternateCharts {
  /** Module constants of the k-th alternate chart (k ≥ 1), deterministic in k. */
  constants(k: number): Readonly<Record<string, unknown>>;
  /** Maps a working solution between the charts with the given constants. */
  convert(x: Float64Array, from: Readonly<Record<string, unknown>>, to: Readonly<Record<string, unknown>>): Float64Array;
}

/**
 * Re-tracks every non-regular end's start along the same legs in alternate charts 1..maxCharts (on this thread, or with
 * `trackerFor`), converting back; an end replaces the old one only when it is regular and distinct from every other
 * regular end. Steps and retries are summed. Returns how many ends were recovered.
 */
export async function retryInOtherCharts(
  working: HomotopyModuleRef, charts: AlternateCharts, legs: readonly ParameterLeg[], starts: readonly Float64Array[], ends: PathEnd[],
  maxCharts = 2, trackerFor: (ref: HomotopyModuleRef) => Promise<LegTracker> = (ref) => createModuleLegTracker(ref),
): Promise<number> {
  let recovered = 0;
  for (let k = 1; k <= maxCharts; k++) {
    const pending = ends.map((e, i) => (e.outcome === 'regular' ? -1 : i)).filter((i) => i >= 0);
    if (pending.length === 0) break;
    const constants = charts.constants(k);
    const track = await trackerFor({ ...working, constants });
    const route = await trackRoute(track, legs, pending.map((i) => charts.convert(starts[i]!, working.constants, constants)));
    const index = createPointIndex(starts[0]!.length / 2);
    ends.forEach((e) => { if (e.outcome === 'regular') index.add(e.point); });
    pending.forEach((i, j) => {
      const e = route.ends[j]!, old = ends[i]!;
      const merged = { steps: e.steps + old.steps, rejectedSteps: e.rejectedSteps + old.rejectedSteps, retries: e.retries + old.retries + 1 };
      if (e.outcome !== 'regular') { ends[i] = { ...old, ...merged }; return; }
      const point = charts.convert(e.point, constants, working.constants);
      if (index.find(point) >= 0) { ends[i] = { ...old, ...merged }; return; }
      index.add(point);
      ends[i] = { ...e, ...merged, point };
      recovered++;
    });
  }
  return recovered;
}
