import { setTimeout as pause } from 'node:timers/promises';
import type { ClusterServices } from './run-on-cluster.ts';
import { commandLineSlurm } from './slurm-client.ts';

/** The services of a real cluster run: sbatch and squeue from PATH, a timer, the wall clock; polls every second. */
export function realClusterServices(): ClusterServices {
  return { slurm: commandLineSlurm(), sleep: (ms) => pause(ms), date: () => new Date(), intervalMs: 1000 };
}
