import type { PathEnd } from '../homotopy.ts';
import type { TrackingPool } from '../pool/job.ts';
import { DEFAULT_TRACKER_SETTINGS, stricterSettings, type TrackerSettings } from '../track/settings.ts';
import type { ParameterLeg } from './gamma-arc.ts';
import { legArgs, type HomotopyModuleRef } from './module-tracker.ts';
import type { LegTracker } from './route.ts';

/**
 * A LegTracker over the worker pool: each leg is one PathJob (starts packed one after another, transferred), keyed
 * per leg so that workers build its homotopy once; `safe` uses stricterSettings(settings, 1). Ends in start order.
 * Overlapping calls may share the pool (each worker keeps Node alive while any of its jobs runs).
 */
export function createPoolLegTracker(pool: TrackingPool, ref: HomotopyModuleRef, settings: Partial<TrackerSettings> = {}): LegTracker {
  const base: TrackerSettings = { ...DEFAULT_TRACKER_SETTINGS, ...ref.settings, ...settings };
  const safeSettings = stricterSettings(base, 1);
  const keys = new WeakMap<ParameterLeg, string>();
  let counter = 0;
  return async (leg: ParameterLeg, starts: readonly Float64Array[], safe: boolean): Promise<PathEnd[]> => {
    if (starts.length === 0) return [];
    let key = keys.get(leg);
    if (key === undefined) { key = `leg-${counter++}-${Math.random().toString(36).slice(2)}`; keys.set(leg, key); }
    const len = starts[0]!.length;
    const packed = new Float64Array(len * starts.length);
    starts.forEach((s, i) => packed.set(s, i * len));
    return pool.track({ homotopyModule: ref.url, args: legArgs(ref, leg), key, n: len / 2, starts: packed, settings: safe ? safeSettings : base });
  };
}
