import { chmodSync, mkdirSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { canonicalJson } from '../../src/atlas/canonical-json.ts';
import { batchScript } from './batch-script.ts';
import { mergeScript } from './merge-script.ts';
import { runLayout } from './run-layout.ts';
import type { RunPlan } from './run-plan.ts';
import { batchArrayArguments, mergeJobArguments, retryArrayArguments } from './sbatch-arguments.ts';
import type { SlurmClient } from './slurm-client.ts';
import { AtlasError } from '../pipeline/atlas-error.ts';

/** The three jobs of a submitted run: the job array, its retry array, the merge job. */
export interface SubmittedRun {
  readonly plan: RunPlan;
  readonly batches: string;
  readonly retry: string;
  readonly merge: string;
}

/**
 * Writes the run folder (plan.json, batch.sh, merge.sh, empty parts/, attempts/, logs/) and submits the job array,
 * the retry array (after the first in any state) and the merge job (after every retry task succeeded). The folder
 * must not exist yet. A refusal by sbatch throws, naming what was already submitted.
 */
export function submitRun(plan: RunPlan, slurm: SlurmClient): SubmittedRun {
  const layout = runLayout(plan.dir);
  mkdirSync(dirname(plan.dir), { recursive: true });
  mkdirSync(plan.dir);
  for (const dir of [layout.parts, layout.attempts, layout.logs]) mkdirSync(dir);
  writeFileSync(layout.plan, canonicalJson(plan));
  writeFileSync(layout.batchScript, batchScript(plan));
  writeFileSync(layout.mergeScript, mergeScript(plan));
  chmodSync(layout.batchScript, 0o755);
  chmodSync(layout.mergeScript, 0o755);
  const submitted: string[] = [];
  const submit = (args: string[]): string => {
    try {
      const id = slurm.submit(args);
      submitted.push(id);
      return id;
    } catch (error) {
      const already = submitted.length > 0 ? ` (already submitted: ${submitted.join(', ')}; scancel them)` : '';
      throw new AtlasError('solve', `${error instanceof Error ? error.message : String(error)}${already}`);
    }
  };
  const batches = submit(batchArrayArguments(plan));
  const retry = submit(retryArrayArguments(plan, batches));
  const merge = submit(mergeJobArguments(plan, retry));
  return { plan, batches, retry, merge };
}
