import type { PathEnd } from '../homotopy.ts';
import type { TrackerSettings } from '../track/settings.ts';

/**
 * A batch of paths for the pool. Contract: `homotopyModule` is the file URL of an ES module exporting
 * `createHomotopy(args): Homotopy`; `args` is structured-cloneable (a compiled system travels as its source
 * text); `starts` holds the start points one after another (each 2n numbers, n = the homotopy's n, given as `n`);
 * every path is tracked by createTracker(homotopy, settings).track(start, tStart, tEnd), and the ends come
 * back in start order. Workers cache the homotopy for the last `key` (omit the key to rebuild every batch).
 */
export interface PathJob {
  readonly homotopyModule: string;
  readonly args: unknown;
  readonly key?: string;
  /** Complex unknowns per start point (the homotopy's n): starts.length = 2·n·paths. */
  readonly n: number;
  readonly starts: Float64Array;
  readonly settings?: Partial<TrackerSettings>;
  readonly tStart?: number;
  readonly tEnd?: number;
}

/** A set of long-lived workers that track path batches; reusable across jobs until terminated. */
export interface TrackingPool {
  readonly size: number;
  /** Tracks every start of the job (split into batches over the workers); ends in start order. */
  track(job: PathJob, onProgress?: (done: number, total: number) => void): Promise<PathEnd[]>;
  /** Stops the workers; the pool cannot be used afterwards. */
  terminate(): Promise<void>;
}
