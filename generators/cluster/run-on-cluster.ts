import { join, resolve } from 'node:path';
import type { CommandContext } from '../command/context.ts';
import { EXIT } from '../command/exit-codes.ts';
import { AtlasError } from '../pipeline/atlas-error.ts';
import type { ClusterRequest } from './cluster-request.ts';
import { listOfBatches, partsProgressLine } from './part-bookkeeping.ts';
import { runFolderName, runLayout } from './run-layout.ts';
import type { RunPlan } from './run-plan.ts';
import type { SlurmClient } from './slurm-client.ts';
import { submitRun } from './submit-run.ts';
import { watchRun, type RunOutcome } from './watch-run.ts';

/** The project root the tasks run in (this checkout; it must sit at the same path on every node). */
export const PROJECT_ROOT = resolve(import.meta.dirname, '../..');

/** One problem to run on the cluster, as the command resolved it. */
export interface ClusterJob {
  /** Registry slug, or the absolute path of a definition file. */
  readonly target: string;
  readonly slug: string;
  readonly seed?: number;
  readonly workers?: number;
  /** Content root to publish into, or null to keep the merged record in the run folder only. */
  readonly publishTo: string | null;
  readonly force: boolean;
}

/** What a cluster run needs from outside: Slurm, a pause, the clock for the folder name. */
export interface ClusterServices {
  readonly slurm: SlurmClient;
  readonly sleep: (ms: number) => Promise<void>;
  readonly date: () => Date;
  readonly intervalMs?: number;
}

/**
 * Submits one problem as a job array plus retry array plus merge job (see submitRun), then either returns at once
 * printing the job ids (--detach, exit 0) or waits, printing parts written / total on stderr, and ends as the merge
 * job did (its summary on stdout, its exit code). When parts never arrive it names the missing batches and their
 * logs, leaves the published record untouched and exits 1.
 */
export async function runOnCluster(ctx: CommandContext, job: ClusterJob, request: ClusterRequest, services: ClusterServices): Promise<number> {
  const dir = join(request.workdir, runFolderName(job.slug, services.date()));
  const plan: RunPlan = {
    target: job.target, slug: job.slug, shards: request.shards, dir, project: PROJECT_ROOT, node: process.execPath,
    ...(job.seed === undefined ? {} : { seed: job.seed }), ...(job.workers === undefined ? {} : { workers: job.workers }),
    ...(request.partition ? { partition: request.partition } : {}), publishTo: job.publishTo, force: job.force,
  };
  const run = submitRun(plan, services.slurm);
  ctx.stderr.write(`${job.slug}: submitted ${request.shards} batch${request.shards === 1 ? '' : 'es'} as job array ${run.batches}, retry array ${run.retry}, merge job ${run.merge}; run folder ${dir}\n`);
  if (request.detach) {
    ctx.stdout.write(`${JSON.stringify({ slug: job.slug, run: dir, batches: run.batches, retry: run.retry, merge: run.merge, shards: request.shards })}\n`);
    return EXIT.ok;
  }
  const outcome = await watchRun(run, { slurm: services.slurm, sleep: services.sleep, intervalMs: services.intervalMs, onParts: (done, total) => ctx.stderr.write(`${partsProgressLine(job.slug, done, total)}\n`) });
  return reportOutcome(ctx, plan, outcome);
}

function reportOutcome(ctx: CommandContext, plan: RunPlan, outcome: RunOutcome): number {
  const layout = runLayout(plan.dir);
  for (const f of outcome.failed) ctx.stderr.write(`${plan.slug}: batch ${f.batch} failed on attempt ${f.attempt} (log: ${join(layout.logs, `batch-${f.batch}-attempt-${f.attempt}.log`)})${f.attempt === 1 ? '; resubmitted once' : ''}\n`);
  if (outcome.status === 'merged') {
    ctx.stdout.write(outcome.stdout);
    ctx.stderr.write(outcome.stderr);
    ctx.stderr.write(`${plan.slug}: merged record in ${layout.record}${plan.publishTo === null ? ' (not published)' : ''}\n`);
    return outcome.exitCode;
  }
  const what = outcome.missing.length > 0
    ? `the parts of batch${outcome.missing.length > 1 ? 'es' : ''} ${listOfBatches(outcome.missing)} of ${plan.shards} never arrived`
    : `every part arrived but the merge job ended without finishing (log: ${layout.mergeErr})`;
  throw new AtlasError('solve', `${plan.slug}: ${what}; nothing merged, the published record is untouched (run folder ${plan.dir})`);
}
