import { Worker } from 'node:worker_threads';
import type { CertifiedBatch, CertifyBatch } from './certify-batch.ts';
import { keepAlive, type KeepAlive } from '../pool/keep-alive.ts';
import { requestWorker } from '../pool/worker-request.ts';

/** Long-lived certification workers (Node backend): run(batch) on an idle worker; each keeps Node alive only while it has a batch. */
export interface CertifyWorkers {
  readonly size: number;
  /** Runs batches on the workers, each worker taking the next batch when free; results in batch order. */
  runAll(batches: (worker: number) => CertifyBatch | null): Promise<CertifiedBatch[]>;
  terminate(): Promise<void>;
}

/** Starts `size` worker threads running certify-worker.ts. */
export function createCertifyWorkers(size: number): CertifyWorkers {
  const workers = Array.from({ length: size }, () => new Worker(new URL('./certify-worker.ts', import.meta.url)));
  const alive = new Map<Worker, KeepAlive>(workers.map((w) => [w, keepAlive(w)]));
  let nextId = 0;
  const run = (worker: Worker, batch: CertifyBatch): Promise<CertifiedBatch> =>
    requestWorker<CertifiedBatch>(worker, alive.get(worker)!, nextId++, { batch }, 'result', 'certification worker');
  return {
    size,
    async runAll(next) {
      const results: CertifiedBatch[] = [];
      let index = 0;
      await Promise.all(workers.map(async (worker, w) => {
        for (let batch = next(w); batch !== null; batch = next(w)) {
          const k = index++;
          results[k] = await run(worker, batch);
        }
      }));
      return results;
    },
    async terminate() {
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
}
