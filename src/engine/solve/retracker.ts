import type { Homotopy, PathEnd } from '../homotopy.ts';
import { createHomotopy } from '../homotopies/compiled-module.ts';
import { compileValuesInDoubleDouble } from '../dd/compile-values.ts';
import { TRACK_FROM, TRACK_TO, type HomotopyPlan } from '../start/plan.ts';
import { createTracker, type Tracker } from '../track/tracker.ts';
import { DEFAULT_TRACKER_SETTINGS, stricterSettings } from '../track/settings.ts';
import type { AffineTools } from './affine.ts';
import { toAffineEnd } from './affine-end.ts';
import type { RetrackMode } from './review-ends.ts';

/**
 * Endgame rounds in double-double (2 radii each, ratio 1/4): the end sits at s = 0, so samples can approach it to
 * s ≈ 1e-25 where double precision stops at 1e-13 (measured: bitangent instance 10's path 172 needs s ≈ 1e-19 before
 * its distance to infinity decays steadily enough to be called diverging).
 */
const EXTENDED_ROUNDS = 20;

/**
 * Re-tracks single paths of a planned homotopy on this thread (re-tracks are few): 'strict' attempt k uses
 * stricterSettings(default, k) (steps and tolerances divided by 4^k); 'extended' the same settings (the default
 * ones for k = 0) with double-double residuals (TrackerSettings.precision) and EXTENDED_ROUNDS endgame rounds, the
 * homotopy's double-double evaluator generated on first use. The end is converted by toAffineEnd. Trackers are made once per mode. Deterministic: the same path and mode
 * give the same end. An 'extended' re-track of an end that kept the point where its endgame began (PathEnd.resumeFrom)
 * re-tracks the end alone, from there.
 */
export function createRetracker(plan: HomotopyPlan, tools: AffineTools): (path: number, mode: RetrackMode, from?: PathEnd) => PathEnd {
  const homotopy = createHomotopy(plan.args);
  const trackers = new Map<string, Tracker>();
  let extended: Homotopy | null = null;
  const extendedHomotopy = (): Homotopy => (extended ??= createHomotopy({ ...plan.args, extendedSource: compileValuesInDoubleDouble(plan.program).source }));
  const len = 2 * plan.N;
  return (path, mode, from) => {
    const key = `${mode.kind}-${mode.attempt}`;
    let tracker = trackers.get(key);
    if (!tracker) {
      const settings = mode.attempt > 0 ? stricterSettings(DEFAULT_TRACKER_SETTINGS, mode.attempt) : DEFAULT_TRACKER_SETTINGS;
      tracker = mode.kind === 'extended' ? createTracker(extendedHomotopy(), { ...settings, precision: 'double-double', maxRounds: EXTENDED_ROUNDS }) : createTracker(homotopy, settings);
      trackers.set(key, tracker);
    }
    const resume = mode.kind === 'extended' && from?.resumeFrom !== undefined && from.resumeAt !== undefined;
    const end = resume ? tracker.track(from.resumeFrom!, from.resumeAt!, TRACK_TO) : tracker.track(plan.starts.subarray(path * len, (path + 1) * len), TRACK_FROM, TRACK_TO);
    return toAffineEnd(end, plan.projectiveGroups, plan.scaling, tools);
  };
}
