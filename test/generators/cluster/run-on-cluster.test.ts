import { existsSync, mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join } from 'node:path';
import { describe, expect, it } from 'vitest';
import type { CommandContext } from '../../../generators/command/context.ts';
import { runOnCluster, type ClusterJob } from '../../../generators/cluster/run-on-cluster.ts';
import type { SlurmClient } from '../../../generators/cluster/slurm-client.ts';

const JOB: ClusterJob = { target: 'some-problem', slug: 'some-problem', publishTo: '/content', force: false };
const WHEN = new Date('2026-12-05T07:30:00Z');

function context() {
  const out = { stdout: '', stderr: '' };
  const ctx = {
    stdout: { write: (t: string) => void (out.stdout += t) },
    stderr: { write: (t: string) => void (out.stderr += t) },
    loadEngine: () => Promise.reject(new Error('not used')),
    engineVersion: async () => 'test',
    now: () => 0,
  } satisfies CommandContext;
  return { ctx, out };
}

/**
 * A stand-in Slurm: numbers the submissions from 41, and plays `script` one step per poll (each step may write parts
 * or the merge's files into the run folder); the jobs stay active until the script runs out.
 */
function fakeSlurm(script: ((dir: string) => void)[]) {
  const submitted: string[][] = [];
  let step = 0;
  let dir = '';
  const slurm: SlurmClient = {
    submit: (args) => { submitted.push([...args]); return String(40 + submitted.length); },
    active: (ids) => (step < script.length ? [...ids] : []),
  };
  const sleep = async (): Promise<void> => {
    dir ||= dirname(submitted[0]!.at(-2)!); // the batch script sits in the run folder
    script[step++]?.(dir);
  };
  return { slurm, sleep, submitted };
}

const part = (k: number) => (dir: string) => writeFileSync(join(dir, 'parts', `part-${k}.json`), '{}');
const merged = (code: number, summary: string) => (dir: string) => {
  writeFileSync(join(dir, 'logs', 'merge.out'), summary);
  writeFileSync(join(dir, 'merge-exit'), `${code}\n`);
};

// The command's contract around Slurm (submission chain, progress, outcome); common practice, no source.
describe('runOnCluster', () => {
  it('--detach: writes the run folder, chains the three jobs and prints their ids at once', async () => {
    const workdir = mkdtempSync(join(tmpdir(), 'cluster-'));
    const { ctx, out } = context();
    const fake = fakeSlurm([]);
    const code = await runOnCluster(ctx, JOB, { shards: 4, workdir, detach: true }, { ...fake, date: () => WHEN });
    expect(code).toBe(0);
    const dir = join(workdir, 'some-problem-20261205T073000Z');
    expect(JSON.parse(out.stdout)).toEqual({ slug: 'some-problem', run: dir, batches: '41', retry: '42', merge: '43', shards: 4 });
    expect(fake.submitted[1]).toContain('--dependency=afterany:41');
    expect(fake.submitted[2]).toContain('--dependency=afterok:42');
    for (const file of ['plan.json', 'batch.sh', 'merge.sh', 'parts', 'attempts', 'logs']) expect(existsSync(join(dir, file))).toBe(true);
  });

  it('waits, reports parts written as they arrive, and ends as the merge job did', async () => {
    const workdir = mkdtempSync(join(tmpdir(), 'cluster-'));
    const { ctx, out } = context();
    const fake = fakeSlurm([part(2), (d) => { part(1)(d); writeFileSync(join(d, 'attempts', 'batch-1-attempt-1.failed'), '75'); }, merged(0, 'summary of the merged record\n')]);
    const code = await runOnCluster(ctx, JOB, { shards: 2, workdir, detach: false }, { ...fake, date: () => WHEN, intervalMs: 0 });
    expect(code).toBe(0);
    expect(out.stdout).toBe('summary of the merged record\n');
    expect(out.stderr).toMatch(/0\/2 parts written \(0%\)\n.*1\/2 parts written \(50%\)\n.*2\/2 parts written \(100%\)\n/);
    expect(out.stderr).toMatch(/batch 1 failed on attempt 1 .*; resubmitted once/);
  });

  it('names the batches whose parts never arrived once no job of the run is left', async () => {
    const workdir = mkdtempSync(join(tmpdir(), 'cluster-'));
    const { ctx } = context();
    const fake = fakeSlurm([part(1), part(3)]);
    await expect(runOnCluster(ctx, JOB, { shards: 4, workdir, detach: false }, { ...fake, date: () => WHEN, intervalMs: 0 }))
      .rejects.toThrow(/the parts of batches 2 and 4 of 4 never arrived; nothing merged, the published record is untouched/);
  });
});
