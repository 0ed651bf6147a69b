import { runLayout } from './run-layout.ts';
import type { RunPlan } from './run-plan.ts';
import { shellLine, shellQuote } from './shell-quote.ts';

/** The environment variable of the failure test hook: `k/a` makes batch k exit 75 on its first a attempts. */
export const FAIL_HOOK_VARIABLE = 'ATLAS_CLUSTER_TEST_FAIL';

/** The exit code of an attempt failed on purpose by the test hook (EX_TEMPFAIL). */
export const HOOK_EXIT_CODE = 75;

/**
 * The bash script every array task runs (`batch.sh <attempt>`): batch $SLURM_ARRAY_TASK_ID of the plan. It exits 0
 * at once when that batch's part is already there (the retry array's tasks for batches that succeeded), otherwise
 * solves the batch with `solve --shard k/n --out` (which writes the part atomically) and, on failure, leaves
 * `attempts/batch-k-attempt-a.failed` holding the exit code.
 */
export function batchScript(plan: RunPlan): string {
  const layout = runLayout(plan.dir);
  const n = plan.shards;
  const solve = [plan.node, '--experimental-strip-types', 'generators/cli.ts', 'solve', plan.target];
  const extra = [...(plan.seed === undefined ? [] : ['--seed', String(plan.seed)]), ...(plan.workers === undefined ? [] : ['--workers', String(plan.workers)])];
  return `#!/bin/bash
# Batch $SLURM_ARRAY_TASK_ID of ${n} of ${plan.slug}: one task of the job array; $1 is the attempt (1, or 2 in the retry array).
set -u
k="\${SLURM_ARRAY_TASK_ID:?run this as a task of a job array}"
attempt="\${1:?attempt number}"
part=${shellQuote(layout.parts)}/part-$k.json
if [ -f "$part" ]; then echo "batch $k of ${n}: part already written"; exit 0; fi
echo "batch $k of ${n} of ${plan.slug}, attempt $attempt, on $(hostname), job \${SLURM_JOB_ID:-?}, started $(date -u +%FT%T.%3NZ)"
hook="\${${FAIL_HOOK_VARIABLE}:-}"
case "$hook" in
  "$k"/[0-9]*) limit="\${hook#*/}" ;;
  *) limit=0 ;;
esac
if [ "$attempt" -le "$limit" ]; then
  echo "test hook ${FAIL_HOOK_VARIABLE}=$hook: batch $k fails attempt $attempt on purpose"
  code=${HOOK_EXIT_CODE}
else
  cd ${shellQuote(plan.project)} && ${shellLine(solve)} --shard "$k/${n}" --out "$part"${extra.length ? ` ${shellLine(extra)}` : ''}
  code=$?
fi
echo "batch $k ended $(date -u +%FT%T.%3NZ) with exit code $code"
if [ "$code" -ne 0 ]; then echo "$code" > ${shellQuote(layout.attempts)}/batch-$k-attempt-$attempt.failed; fi
exit "$code"
`;
}
