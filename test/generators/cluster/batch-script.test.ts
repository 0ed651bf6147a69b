import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync, chmodSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { batchScript, HOOK_EXIT_CODE } from '../../../generators/cluster/batch-script.ts';
import { runLayout } from '../../../generators/cluster/run-layout.ts';
import type { RunPlan } from '../../../generators/cluster/run-plan.ts';

/** A run folder whose "node" is a stand-in that logs its arguments, writes the --out file and exits with FAKE_EXIT. */
function fakeRun(): { plan: RunPlan; calls: string } {
  const dir = mkdtempSync(join(tmpdir(), 'batch-script-'));
  const layout = runLayout(join(dir, 'run'));
  for (const d of [layout.dir, layout.parts, layout.attempts]) mkdirSync(d, { recursive: true });
  const calls = join(dir, 'calls.txt');
  const node = join(dir, 'fake node');
  writeFileSync(node, `#!/bin/bash\necho "$*" >> ${JSON.stringify(calls)}\nout=""\nwhile [ $# -gt 0 ]; do [ "$1" = --out ] && out="$2"; shift; done\n[ "\${FAKE_EXIT:-0}" = 0 ] && echo '{}' > "$out"\nexit "\${FAKE_EXIT:-0}"\n`);
  chmodSync(node, 0o755);
  const plan: RunPlan = { target: 'some-problem', slug: 'some-problem', shards: 3, dir: layout.dir, project: dir, node, seed: 5, workers: 2, publishTo: null, force: false };
  writeFileSync(layout.batchScript, batchScript(plan));
  return { plan, calls };
}

function runTask(plan: RunPlan, batch: number, attempt: number, env: Record<string, string> = {}): number | null {
  return spawnSync('bash', [runLayout(plan.dir).batchScript, String(attempt)], { env: { PATH: process.env.PATH!, SLURM_ARRAY_TASK_ID: String(batch), ...env }, encoding: 'utf8' }).status;
}

// The task's contract (solve the batch, mark failures, obey the test hook); common practice, no source.
describe('the batch script of an array task', () => {
  it('solves its batch with the plan\'s seed and workers and writes part-k.json', () => {
    const { plan, calls } = fakeRun();
    expect(runTask(plan, 2, 1)).toBe(0);
    expect(existsSync(join(plan.dir, 'parts', 'part-2.json'))).toBe(true);
    expect(readFileSync(calls, 'utf8')).toBe(`--experimental-strip-types generators/cli.ts solve some-problem --shard 2/3 --out ${plan.dir}/parts/part-2.json --seed 5 --workers 2\n`);
  });

  it('exits 0 without solving when its part is already there (a retry task of a batch that succeeded)', () => {
    const { plan, calls } = fakeRun();
    writeFileSync(join(plan.dir, 'parts', 'part-1.json'), '{}');
    expect(runTask(plan, 1, 2)).toBe(0);
    expect(existsSync(calls)).toBe(false);
  });

  it('records a failed solve with its exit code', () => {
    const { plan } = fakeRun();
    expect(runTask(plan, 3, 1, { FAKE_EXIT: '3' })).toBe(3);
    expect(readFileSync(join(plan.dir, 'attempts', 'batch-3-attempt-1.failed'), 'utf8').trim()).toBe('3');
    expect(existsSync(join(plan.dir, 'parts', 'part-3.json'))).toBe(false);
  });

  it.each([
    ['2/1', 2, 1, HOOK_EXIT_CODE],
    ['2/1', 2, 2, 0],
    ['2/1', 1, 1, 0],
    ['2/2', 2, 2, HOOK_EXIT_CODE],
    ['nonsense', 2, 1, 0],
  ])('test hook %s: batch %i, attempt %i exits %i', (hook, batch, attempt, code) => {
    const { plan } = fakeRun();
    expect(runTask(plan, batch, attempt, { ATLAS_CLUSTER_TEST_FAIL: hook })).toBe(code);
    expect(existsSync(join(plan.dir, 'attempts', `batch-${batch}-attempt-${attempt}.failed`))).toBe(code !== 0);
  });
});
