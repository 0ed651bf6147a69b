import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { createNodePool } from '../../../src/engine/pool/node-pool.ts';
import { trackBatch } from '../../../src/engine/pool/track-batch.ts';
import { COMPILED_HOMOTOPY_MODULE } from '../../../src/engine/homotopies/compiled-module.ts';
import { planHomotopy } from '../../../src/engine/start/plan.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { randomSystem } from '../../../generators/bench/engine-systems.ts';
import type { PathEnd } from '../../../src/engine/homotopy.ts';

// Common practice, no source: parallel tracking must not change any path's result (paths are independent).
const pool = createNodePool(2);
afterAll(() => pool.terminate());
const plain = (ends: PathEnd[]) => JSON.stringify(ends, (_, v) => (v instanceof Float64Array ? Array.from(v) : v));

describe('the Node worker pool', () => {
  const plan = planHomotopy(randomSystem(createRandom(8), 2, 3), new Float64Array(0), 8, 'total-degree');
  const job = () => ({ homotopyModule: COMPILED_HOMOTOPY_MODULE, args: plan.args, key: 'cubics-8', n: plan.N, starts: plan.starts.slice() });

  it('returns the same ends, in start order, as tracking in this thread', async () => {
    const local = await trackBatch(job());
    const pooled = await pool.track(job());
    expect(pooled).toHaveLength(9);
    expect(plain(pooled)).toBe(plain(local));
  });

  it('stays warm and reusable for another job, and reports progress', async () => {
    const seen: number[] = [];
    const again = await pool.track(job(), (done, total) => { seen.push(done); expect(total).toBe(9); });
    expect(again).toHaveLength(9);
    expect(seen[seen.length - 1]).toBe(9);
  });

  it('finishes overlapping jobs on a one-worker pool, each with its own ends in start order', async () => {
    const one = createNodePool(1);
    try {
      const [a, b, c] = await Promise.all([one.track(job()), one.track({ ...job(), starts: plan.starts.slice(0, 2 * plan.N) }), one.track(job())]);
      expect([a, b, c].map((e) => e.length)).toEqual([9, 1, 9]);
      expect(plain(a)).toBe(plain(c));
      expect(plain(b)).toBe(plain(a.slice(0, 1)));
    } finally {
      await one.terminate();
    }
  });

  it('keeps Node alive until the last of several overlapping jobs is done', async () => {
    // Regression: ending one job used to unref its worker while another job still ran there, so Node exited mid-run.
    const script = fileURLToPath(new URL('./fixtures/overlapping-jobs.ts', import.meta.url));
    const run = await new Promise<{ code: number; stdout: string }>((resolve) => {
      execFile(process.execPath, ['--experimental-strip-types', '--no-warnings', script], (error, stdout) => resolve({ code: error ? Number(error.code) : 0, stdout }));
    });
    expect(run).toEqual({ code: 0, stdout: '9 64 64\n' });
  }, 30_000);

  it('names a module that does not export createHomotopy', async () => {
    await expect(pool.track({ ...job(), homotopyModule: new URL('../../../src/engine/version.ts', import.meta.url).href })).rejects.toThrow(/does not export createHomotopy/);
  });

  it('rejects starts whose length is not a multiple of 2n', async () => {
    await expect(pool.track({ ...job(), starts: new Float64Array(5) })).rejects.toThrow(/not a multiple of 2n/);
  });
});
