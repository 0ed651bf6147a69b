// Pool worker (Node worker_threads): receives { id, job } messages, answers { id, ends } or { id, error }.
import { parentPort } from 'node:worker_threads';
import { trackBatch } from './track-batch.ts';
import type { PathJob } from './job.ts';

parentPort!.on('message', (message: { id: number; job: PathJob }) => {
  trackBatch(message.job).then(
    (ends) => parentPort!.postMessage({ id: message.id, ends }, ends.map((e) => e.point.buffer as ArrayBuffer)),
    (error: unknown) => parentPort!.postMessage({ id: message.id, error: error instanceof Error ? `${error.message}\n${error.stack}` : String(error) }),
  );
});
