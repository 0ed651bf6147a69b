import type { PathEnd } from '../homotopy.ts';
import { createHomotopy } from '../homotopies/compiled-module.ts';
import type { HomotopyPlan } from '../start/plan.ts';
import { createTracker, type Tracker } from '../track/tracker.ts';
import { DEFAULT_TRACKER_SETTINGS, stricterSettings } from '../track/settings.ts';
import type { AffineTools } from './affine.ts';
import { toAffineEnd } from './affine-end.ts';
import type { RetrackMode } from './review-ends.ts';

/**
 * Re-tracks single paths of a planned homotopy on this thread (re-tracks are few): 'strict' attempt k uses
 * stricterSettings(default, k) (steps and tolerances divided by 4^k); the end is converted by toAffineEnd. Trackers
 * are made once per mode. Deterministic: the same path and mode give the same end.
 */
export function createRetracker(plan: HomotopyPlan, tools: AffineTools): (path: number, mode: RetrackMode) => PathEnd {
  const homotopy = createHomotopy(plan.args);
  const trackers = new Map<string, Tracker>();
  const len = 2 * plan.N;
  return (path, mode) => {
    const key = mode.kind === 'strict' ? `strict-${mode.attempt}` : 'extended';
    let tracker = trackers.get(key);
    if (!tracker) {
      if (mode.kind === 'extended') throw new Error('double-double re-tracking is not available for this homotopy');
      tracker = createTracker(homotopy, stricterSettings(DEFAULT_TRACKER_SETTINGS, mode.attempt));
      trackers.set(key, tracker);
    }
    const end = tracker.track(plan.starts.subarray(path * len, (path + 1) * len));
    return toAffineEnd(end, plan.projectiveGroups, plan.scaling, tools);
  };
}
