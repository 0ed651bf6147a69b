import type { TrackingPool } from './job.ts';

let shared: { size: number; pool: Promise<TrackingPool> } | null = null;

/**
 * The process-wide pool of `size` workers, created on first use and kept warm for later solves (a different
 * size replaces it). The Node backend is loaded lazily, so browser bundles never see worker_threads.
 * Idle workers do not keep Node alive; call closeSharedPool() to end them explicitly.
 */
export function sharedPool(size: number): Promise<TrackingPool> {
  if (shared !== null && shared.size === size) return shared.pool;
  const old = shared;
  const pool = (async () => {
    if (old !== null) await (await old.pool).terminate();
    const { createNodePool } = await import('./node-pool.ts');
    return createNodePool(size);
  })();
  shared = { size, pool };
  return pool;
}

/** Terminates the shared pool, if any. */
export async function closeSharedPool(): Promise<void> {
  const old = shared;
  shared = null;
  if (old !== null) await (await old.pool).terminate();
}
