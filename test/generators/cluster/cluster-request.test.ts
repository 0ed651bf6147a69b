import { describe, expect, it } from 'vitest';
import { clusterRequest, DEFAULT_SHARDS } from '../../../generators/cluster/cluster-request.ts';

// Option handling only; common practice, no source.
describe('clusterRequest', () => {
  it.each([
    ['no --slurm: no cluster run', {}, undefined],
    ['--slurm alone: default shards, workdir under the working directory', { slurm: true }, { shards: DEFAULT_SHARDS, workdir: '/home/u/atlas/.cluster-runs', detach: false }],
    ['every option', { slurm: true, shards: '32', partition: 'batch', workdir: '/shared/runs', detach: true }, { shards: 32, partition: 'batch', workdir: '/shared/runs', detach: true }],
    ['a relative workdir is resolved', { slurm: true, workdir: 'runs' }, { shards: DEFAULT_SHARDS, workdir: '/home/u/atlas/runs', detach: false }],
  ])('%s', (_name, values, expected) => {
    expect(clusterRequest(values, '/home/u/atlas')).toEqual(expected);
  });

  it.each([
    ['--shards without --slurm', { shards: '4' }, /--shards goes with --slurm/],
    ['--detach without --slurm', { detach: true }, /--detach goes with --slurm/],
    ['zero shards', { slurm: true, shards: '0' }, /--shards: must be an integer ≥ 1/],
    ['a non-number of shards', { slurm: true, shards: 'many' }, /--shards: must be an integer ≥ 1/],
    ['more shards than an array allows here', { slurm: true, shards: '10001' }, /at most 10000/],
    ['a partition name with a space', { slurm: true, partition: 'a b' }, /--partition: a partition name/],
  ])('refuses %s', (_name, values, message) => {
    expect(() => clusterRequest(values, '/tmp')).toThrow(message);
  });
});
