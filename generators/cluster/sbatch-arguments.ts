import { join } from 'node:path';
import { runLayout } from './run-layout.ts';
import type { RunPlan } from './run-plan.ts';

function common(plan: RunPlan, name: string): string[] {
  return [
    '--parsable',
    `--job-name=atlas-${plan.slug}-${name}`,
    `--chdir=${plan.project}`,
    ...(plan.partition ? [`--partition=${plan.partition}`] : []),
  ];
}

/** sbatch arguments of the first job array: one task per batch, attempt 1, CPUs per task = workers. */
export function batchArrayArguments(plan: RunPlan): string[] {
  const layout = runLayout(plan.dir);
  return [
    ...common(plan, 'batches'), `--array=1-${plan.shards}`, `--cpus-per-task=${plan.workers ?? 1}`,
    `--output=${join(layout.logs, 'batch-%a-attempt-1.log')}`, layout.batchScript, '1',
  ];
}

/**
 * sbatch arguments of the retry array: the same tasks, attempt 2, once the first array has ended in any state;
 * a task whose part is already written exits at once, so only failed batches are solved again.
 */
export function retryArrayArguments(plan: RunPlan, firstArrayId: string): string[] {
  const layout = runLayout(plan.dir);
  return [
    ...common(plan, 'retry'), `--array=1-${plan.shards}`, `--cpus-per-task=${plan.workers ?? 1}`,
    `--dependency=afterany:${firstArrayId}`,
    `--output=${join(layout.logs, 'batch-%a-attempt-2.log')}`, layout.batchScript, '2',
  ];
}

/** sbatch arguments of the merge job: only after every retry task succeeded; cancelled by Slurm if one failed. */
export function mergeJobArguments(plan: RunPlan, retryArrayId: string): string[] {
  const layout = runLayout(plan.dir);
  return [
    ...common(plan, 'merge'), `--dependency=afterok:${retryArrayId}`, '--kill-on-invalid-dep=yes',
    `--output=${layout.mergeOut}`, `--error=${layout.mergeErr}`, layout.mergeScript,
  ];
}

/** The job id in `sbatch --parsable` output (`1234` or `1234;cluster`); throws when there is none. */
export function parsableJobId(output: string): string {
  const m = /^\s*(\d+)(?:;\S+)?\s*$/.exec(output);
  if (!m) throw new Error(`sbatch printed no job id: ${JSON.stringify(output.trim().slice(0, 200))}`);
  return m[1]!;
}
