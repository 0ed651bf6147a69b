import type { Worker } from 'node:worker_threads';
import type { KeepAlive } from './keep-alive.ts';

/**
 * One request to a long-lived worker (Node backend): posts { id, [key]: payload } (moving `transfer`), holds the
 * worker's keep-alive until the reply { id, result | error } with the same id arrives, then resolves with the reply's
 * `field` or rejects with `${label} failed: error`; a worker 'error' event rejects too. Listeners are removed on settle.
 */
export function requestWorker<T>(
  worker: Worker, alive: KeepAlive, id: number, message: Record<string, unknown>, field: string, label: string, transfer: ArrayBuffer[] = [],
): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const onMessage = (m: { id: number; error?: string } & Record<string, unknown>): void => {
      if (m.id !== id) return;
      cleanup();
      if (m.error !== undefined) reject(new Error(`${label} failed: ${m.error}`));
      else resolve(m[field] as T);
    };
    const onError = (e: Error): void => { cleanup(); reject(e); };
    const cleanup = (): void => { worker.off('message', onMessage); worker.off('error', onError); alive.release(); };
    alive.hold();
    worker.on('message', onMessage);
    worker.on('error', onError);
    worker.postMessage({ id, ...message }, transfer);
  });
}
