import type { Homotopy, PathEnd } from '../homotopy.ts';
import { createTracker, type Tracker } from '../track/tracker.ts';
import type { PathJob } from './job.ts';

let cached: { key: string; tracker: Tracker } | null = null;

/**
 * Runs one batch of a PathJob in the current thread (the body of a worker, and the in-process fallback):
 * imports the homotopy module, builds (or reuses, by key and settings) the tracker, tracks every start in order.
 */
export async function trackBatch(job: PathJob, onPath?: (done: number) => void): Promise<PathEnd[]> {
  const key = job.key === undefined ? null : `${job.homotopyModule}\n${job.key}\n${JSON.stringify(job.settings ?? {})}`;
  let tracker: Tracker;
  if (key !== null && cached !== null && cached.key === key) tracker = cached.tracker;
  else {
    const module = (await import(job.homotopyModule)) as { createHomotopy?: (args: unknown) => Homotopy };
    if (typeof module.createHomotopy !== 'function') throw new TypeError(`${job.homotopyModule} does not export createHomotopy(args)`);
    tracker = createTracker(module.createHomotopy(job.args), job.settings);
    cached = key === null ? null : { key, tracker };
  }
  return trackStarts(tracker, job.starts, job.tStart ?? 0, job.tEnd ?? 1, onPath);
}

/** Tracks the packed start points one after another with the tracker; ends in start order; onPath(done) after each. */
export function trackStarts(tracker: Tracker, starts: Float64Array, tStart = 0, tEnd = 1, onPath?: (done: number) => void): PathEnd[] {
  const len = 2 * tracker.stepper.n;
  if (starts.length % len !== 0) throw new RangeError(`starts has length ${starts.length}, not a multiple of ${len}`);
  const ends: PathEnd[] = [];
  for (let k = 0; k < starts.length / len; k++) {
    ends.push(tracker.track(starts.subarray(k * len, (k + 1) * len), tStart, tEnd));
    onPath?.(k + 1);
  }
  return ends;
}
