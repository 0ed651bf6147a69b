import { describe, expect, it } from 'vitest';
import { batchArrayArguments, mergeJobArguments, parsableJobId, retryArrayArguments } from '../../../generators/cluster/sbatch-arguments.ts';
import type { RunPlan } from '../../../generators/cluster/run-plan.ts';

const PLAN: RunPlan = {
  target: 'lines-on-a-cubic-surface', slug: 'lines-on-a-cubic-surface', shards: 16, dir: '/shared/runs/r1', project: '/shared/atlas',
  node: '/opt/node/bin/node', workers: 4, partition: 'short', publishTo: '/shared/atlas/content', force: false,
};

// The job chain as sbatch(1) documents --array, --dependency=afterany/afterok and --kill-on-invalid-dep; common practice.
describe('sbatch arguments', () => {
  it('the first array runs one task per batch with the workers as CPUs, attempt 1', () => {
    expect(batchArrayArguments(PLAN)).toEqual([
      '--parsable', '--job-name=atlas-lines-on-a-cubic-surface-batches', '--chdir=/shared/atlas', '--partition=short',
      '--array=1-16', '--cpus-per-task=4', '--output=/shared/runs/r1/logs/batch-%a-attempt-1.log', '/shared/runs/r1/batch.sh', '1',
    ]);
  });

  it('the retry array waits for the first in any state and is attempt 2', () => {
    const args = retryArrayArguments(PLAN, '501');
    expect(args).toContain('--dependency=afterany:501');
    expect(args).toContain('--array=1-16');
    expect(args.slice(-2)).toEqual(['/shared/runs/r1/batch.sh', '2']);
  });

  it('the merge waits for every retry task to succeed and is dropped otherwise', () => {
    const args = mergeJobArguments(PLAN, '502');
    expect(args).toEqual(expect.arrayContaining(['--dependency=afterok:502', '--kill-on-invalid-dep=yes', '--output=/shared/runs/r1/logs/merge.out', '--error=/shared/runs/r1/logs/merge.err']));
    expect(args.at(-1)).toBe('/shared/runs/r1/merge.sh');
    expect(args.some((a) => a.startsWith('--array'))).toBe(false);
  });

  it('without a partition or workers: no --partition, one CPU per task', () => {
    const args = batchArrayArguments({ ...PLAN, partition: undefined, workers: undefined });
    expect(args.some((a) => a.startsWith('--partition'))).toBe(false);
    expect(args).toContain('--cpus-per-task=1');
  });

  it.each([
    ['1234\n', '1234'],
    ['1234;cluster-a\n', '1234'],
  ])('parsableJobId(%j) = %s', (out, id) => {
    expect(parsableJobId(out)).toBe(id);
  });

  it('parsableJobId refuses output without a job id', () => {
    expect(() => parsableJobId('sbatch: error: invalid partition\n')).toThrow(/no job id/);
  });
});
