import { Worker } from 'node:worker_threads';
import type { CertifiedBatch, CertifyBatch } from './certify-batch.ts';

/** Long-lived certification workers (Node backend): run(batch) on an idle worker; unref'd while idle. */
export interface CertifyWorkers {
  readonly size: number;
  /** Runs batches on the workers, each worker taking the next batch when free; results in batch order. */
  runAll(batches: (worker: number) => CertifyBatch | null): Promise<CertifiedBatch[]>;
  terminate(): Promise<void>;
}

/** Starts `size` worker threads running certify-worker.ts. */
export function createCertifyWorkers(size: number): CertifyWorkers {
  const workers = Array.from({ length: size }, () => {
    const w = new Worker(new URL('./certify-worker.ts', import.meta.url));
    w.unref();
    return w;
  });
  let nextId = 0;
  const run = (worker: Worker, batch: CertifyBatch): Promise<CertifiedBatch> => new Promise((resolve, reject) => {
    const id = nextId++;
    const onMessage = (m: { id: number; result?: CertifiedBatch; error?: string }): void => {
      if (m.id !== id) return;
      cleanup();
      if (m.error !== undefined) reject(new Error(`certification worker failed: ${m.error}`));
      else resolve(m.result!);
    };
    const onError = (e: Error): void => { cleanup(); reject(e); };
    const cleanup = (): void => { worker.off('message', onMessage); worker.off('error', onError); worker.unref(); };
    worker.ref();
    worker.on('message', onMessage);
    worker.on('error', onError);
    worker.postMessage({ id, batch });
  });
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
