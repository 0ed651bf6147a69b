import type { TestProject } from 'vitest/node';
import { ensureSlurmInstalled } from './local-slurm/install-slurm.ts';
import { startLocalSlurm } from './local-slurm/start-local-slurm.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    /** Environment the Slurm clients need (SLURM_CONF of the cluster started for the tests, or nothing). */
    slurmEnv: Record<string, string>;
  }
}

/** test:slurm's global setup: install slurm-wlm and munge if missing, bring up a one-node cluster, stop what it started. */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const log = (line: string): void => void process.stderr.write(`${line}\n`);
  ensureSlurmInstalled(log);
  const slurm = await startLocalSlurm(log);
  project.provide('slurmEnv', slurm.env);
  return async () => {
    await slurm.stop();
    if (slurm.started.length > 0) log(`test:slurm: stopped ${slurm.started.join(', ')}`);
  };
}
