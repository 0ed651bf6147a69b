import { execFileSync } from 'node:child_process';
import { parsableJobId } from './sbatch-arguments.ts';

/** What a cluster run asks of Slurm: submit a batch script, and which of some jobs are still queued or running. */
export interface SlurmClient {
  /** Runs `sbatch <args>` and returns the job id; throws with sbatch's message when it refuses. */
  submit(args: readonly string[]): string;
  /** The ids among `jobIds` that squeue still lists (pending, running or completing), array tasks folded into their job. */
  active(jobIds: readonly string[]): string[];
}

/** The client that runs sbatch and squeue from PATH (SLURM_CONF and the rest of the environment pass through). */
export function commandLineSlurm(): SlurmClient {
  return {
    submit(args) {
      try {
        return parsableJobId(execFileSync('sbatch', [...args], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] }));
      } catch (error) {
        const e = error as { stderr?: string; message?: string; code?: string };
        const why = e.code === 'ENOENT' ? 'sbatch is not on PATH (is this a Slurm login node?)' : (e.stderr || e.message || String(error)).trim();
        throw new Error(`sbatch failed: ${why}`);
      }
    },
    active(jobIds) {
      let listed = '';
      try {
        listed = execFileSync('squeue', ['--noheader', '--format=%F', `--jobs=${jobIds.join(',')}`], { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
      } catch (error) {
        // squeue refuses ids that have left the controller's memory: those jobs are over. Any other failure (the
        // controller briefly unreachable) says nothing, so the jobs count as still active.
        return /invalid job id/i.test(String((error as { stderr?: string }).stderr ?? '')) ? [] : [...jobIds];
      }
      const seen = new Set(listed.split('\n').map((s) => s.trim()).filter(Boolean));
      return jobIds.filter((id) => seen.has(id));
    },
  };
}
