/** What keepAlive needs of a worker: Node's Worker ref()/unref() (which do not count, so one unref undoes many refs). */
export interface Refable {
  ref(): void;
  unref(): void;
}

/** Counts the jobs running on one worker: hold() before posting a job, release() when it settles. */
export interface KeepAlive {
  hold(): void;
  release(): void;
  /** Jobs currently running on the worker. */
  readonly active: number;
}

/**
 * Ref-counts a worker's running jobs: the worker is ref'd (keeps Node alive) from the first hold() and unref'd only
 * when the last running job is released, so overlapping jobs on one worker cannot let Node exit while any still runs.
 * The worker starts unref'd (idle). A release() without a matching hold() throws.
 */
export function keepAlive(worker: Refable): KeepAlive {
  worker.unref();
  let active = 0;
  return {
    hold() {
      if (active++ === 0) worker.ref();
    },
    release() {
      if (active === 0) throw new Error('keepAlive: release() without a running job');
      if (--active === 0) worker.unref();
    },
    get active() {
      return active;
    },
  };
}
