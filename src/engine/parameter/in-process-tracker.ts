import type { Homotopy, PathEnd } from '../homotopy.ts';
import { createTracker } from '../track/tracker.ts';
import { stricterSettings, DEFAULT_TRACKER_SETTINGS, type TrackerSettings } from '../track/settings.ts';
import type { ParameterLeg } from './gamma-arc.ts';
import type { LegTracker } from './route.ts';

/**
 * A LegTracker on the calling thread (small problems, tests, and the worker side of the pool): builds the leg's
 * homotopy with `homotopyFor` and tracks every start with the engine's tracker; `safe` uses stricterSettings(·, 1).
 */
export function createInProcessLegTracker(homotopyFor: (leg: ParameterLeg) => Homotopy, settings: Partial<TrackerSettings> = {}): LegTracker {
  const base: TrackerSettings = { ...DEFAULT_TRACKER_SETTINGS, ...settings };
  return async (leg, starts, safe) => {
    const tracker = createTracker(homotopyFor(leg), safe ? stricterSettings(base, 1) : base);
    return starts.map((s): PathEnd => tracker.track(s));
  };
}
