import { Worker } from 'node:worker_threads';
import { availableParallelism } from 'node:os';
import type { PathEnd } from '../homotopy.ts';
import type { PathJob, TrackingPool } from './job.ts';
import { keepAlive, type KeepAlive } from './keep-alive.ts';
import { requestWorker } from './worker-request.ts';

/**
 * The Node backend of the tracking pool: `size` long-lived worker_threads (default availableParallelism()).
 * Jobs are cut into shrinking batches (guided scheduling: a quarter of the remaining paths per worker, at most 256,
 * at least 1) handed to idle workers in order, so that the workers finish together; ends are reassembled in start
 * order, so results do not depend on the pool size. Overlapping track()
 * calls share the workers; each worker keeps Node alive while any of its jobs runs and is unref'd only when idle, so
 * an idle pool never keeps Node alive and a busy one never lets it exit; terminate() ends them.
 */
export function createNodePool(size = availableParallelism()): TrackingPool {
  if (!Number.isInteger(size) || size < 1) throw new RangeError(`pool size must be a positive integer, got ${size}`);
  const workers = Array.from({ length: size }, () => new Worker(new URL('./worker.ts', import.meta.url)));
  const alive = new Map<Worker, KeepAlive>(workers.map((w) => [w, keepAlive(w)]));
  let nextId = 0;
  let terminated = false;
  const run = (worker: Worker, job: PathJob): Promise<PathEnd[]> =>
    requestWorker<PathEnd[]>(worker, alive.get(worker)!, nextId++, { job }, 'ends', 'pool worker', [job.starts.buffer as ArrayBuffer]);
  return {
    size,
    async track(job, onProgress) {
      if (terminated) throw new Error('the tracking pool was terminated');
      const total = job.starts.length;
      const perPoint = 2 * job.n;
      if (!(perPoint > 0) || total % perPoint !== 0) throw new RangeError(`pool job: starts length ${total} is not a multiple of 2n = ${perPoint}`);
      const paths = total / perPoint;
      const results: PathEnd[][] = [];
      let next = 0, done = 0;
      const loop = async (worker: Worker): Promise<void> => {
        while (next < paths) {
          const batch = Math.max(1, Math.min(256, Math.ceil((paths - next) / (4 * size))));
          const k = next, end = Math.min(paths, k + batch);
          next = end;
          const starts = job.starts.slice(k * perPoint, end * perPoint);
          results[k] = await run(worker, { ...job, starts });
          done += end - k;
          onProgress?.(done, paths);
        }
      };
      await Promise.all(workers.map(loop));
      return results.flat(); // sparse, indexed by first path: flat() keeps start order
    },
    async terminate() {
      terminated = true;
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
}
