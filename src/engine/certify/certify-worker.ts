import { parentPort } from 'node:worker_threads';
import { certifyBatch, type CertifyBatch } from './certify-batch.ts';

/** Worker body of the parallel certifier: certifies batches, replies { id, result } or { id, error }. */
parentPort!.on('message', (m: { id: number; batch: CertifyBatch }) => {
  try {
    const result = certifyBatch(m.batch);
    parentPort!.postMessage({ id: m.id, result }, [result.radii.buffer as ArrayBuffer, result.boxes.buffer as ArrayBuffer, result.enclosures.buffer as ArrayBuffer, result.flags.buffer as ArrayBuffer]);
  } catch (e) {
    parentPort!.postMessage({ id: m.id, error: e instanceof Error ? e.message : String(e) });
  }
});
