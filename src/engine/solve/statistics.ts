import type { PathEnd } from '../homotopy.ts';
import type { PathStatistics } from './types.ts';

/** Counts outcomes (they add up to ends.length), failure reasons (sorted keys), steps median/max and retries. */
export function pathStatistics(ends: readonly PathEnd[]): PathStatistics {
  const stats: PathStatistics = { tracked: ends.length, regular: 0, singular: 0, excess: 0, atInfinity: 0, failed: 0, failures: {}, stepsMedian: 0, stepsMax: 0, retries: 0 };
  const failures = new Map<string, number>();
  for (const e of ends) {
    if (e.outcome === 'regular') stats.regular++;
    else if (e.outcome === 'singular') stats.singular++;
    else if (e.outcome === 'excess') stats.excess++;
    else if (e.outcome === 'at-infinity') stats.atInfinity++;
    else {
      stats.failed++;
      const why = e.failure ?? 'unknown';
      failures.set(why, (failures.get(why) ?? 0) + 1);
    }
    stats.retries += e.retries;
  }
  for (const k of [...failures.keys()].sort()) stats.failures[k] = failures.get(k)!;
  const steps = ends.map((e) => e.steps).sort((a, b) => a - b);
  stats.stepsMedian = median(steps);
  stats.stepsMax = steps.length > 0 ? steps[steps.length - 1]! : 0;
  return stats;
}

/** Median of an ascending array (mean of the middle two for even length; 0 when empty). */
export function median(sorted: readonly number[]): number {
  if (sorted.length === 0) return 0;
  const m = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[m]! : (sorted[m - 1]! + sorted[m]!) / 2;
}
