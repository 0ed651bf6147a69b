import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { batchesDone, batchesMissing, failedAttempts, type FailedAttempt } from './part-bookkeeping.ts';
import { runLayout } from './run-layout.ts';
import type { SlurmClient } from './slurm-client.ts';
import type { SubmittedRun } from './submit-run.ts';

/** How a watched run ended: merged (with the merge job's exit code and output), or with parts that never arrived. */
export type RunOutcome =
  | { readonly status: 'merged'; readonly exitCode: number; readonly stdout: string; readonly stderr: string; readonly failed: readonly FailedAttempt[] }
  | { readonly status: 'incomplete'; readonly missing: readonly number[]; readonly failed: readonly FailedAttempt[] };

/** What watching needs besides the run: Slurm, a pause, and a callback for every change in the number of parts. */
export interface WatchOptions {
  readonly slurm: SlurmClient;
  readonly sleep: (ms: number) => Promise<void>;
  readonly onParts: (done: number, total: number) => void;
  /** Poll interval in milliseconds (default 1000). */
  readonly intervalMs?: number;
}

/**
 * Waits for a submitted run by reading its folder: reports the number of parts written whenever it changes, and ends
 * when the merge job has written `merge-exit`, or when none of the run's jobs is queued or running any more (twice
 * in a row, so a merge that is just finishing is not missed) without it: then the batches without a part are missing.
 */
export async function watchRun(run: SubmittedRun, options: WatchOptions): Promise<RunOutcome> {
  const layout = runLayout(run.plan.dir);
  const count = run.plan.shards;
  const list = (dir: string): string[] => (existsSync(dir) ? readdirSync(dir) : []);
  let reported = -1;
  let idlePolls = 0;
  for (;;) {
    const done = batchesDone(list(layout.parts), count);
    if (done.length !== reported) options.onParts((reported = done.length), count);
    if (existsSync(layout.mergeExit)) {
      const read = (file: string): string => (existsSync(file) ? readFileSync(file, 'utf8') : '');
      const code = Number(read(layout.mergeExit).trim());
      return { status: 'merged', exitCode: Number.isInteger(code) ? code : 1, stdout: read(layout.mergeOut), stderr: read(layout.mergeErr), failed: failedAttempts(list(layout.attempts)) };
    }
    idlePolls = options.slurm.active([run.batches, run.retry, run.merge]).length === 0 ? idlePolls + 1 : 0;
    if (idlePolls >= 2) return { status: 'incomplete', missing: batchesMissing(done, count), failed: failedAttempts(list(layout.attempts)) };
    await options.sleep(options.intervalMs ?? 1000);
  }
}
