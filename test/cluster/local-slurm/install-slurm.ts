import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';

/** The programs a one-node cluster needs (Debian paths). */
const PROGRAMS = ['/usr/bin/sbatch', '/usr/bin/squeue', '/usr/bin/sinfo', '/usr/sbin/slurmctld', '/usr/sbin/slurmd', '/usr/sbin/munged'];

/**
 * Installs Debian's slurm-wlm and munge with apt-get when any of their programs is missing (root only); a no-op
 * when all are there. Throws with apt's last lines when the install fails.
 */
export function ensureSlurmInstalled(log: (line: string) => void): void {
  const missing = PROGRAMS.filter((p) => !existsSync(p));
  if (missing.length === 0) return;
  if (process.getuid?.() !== 0) throw new Error(`test:slurm: ${missing.join(', ')} missing, and installing slurm-wlm and munge needs root`);
  log(`test:slurm: installing slurm-wlm and munge (missing: ${missing.join(', ')})`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  try {
    execFileSync('apt-get', ['update', '-qq'], { env, stdio: 'pipe' });
    execFileSync('apt-get', ['install', '-y', '-qq', '--no-install-recommends', 'slurm-wlm', 'munge'], { env, stdio: 'pipe' });
  } catch (error) {
    const e = error as { stdout?: Buffer; stderr?: Buffer };
    throw new Error(`test:slurm: apt-get failed:\n${`${e.stdout ?? ''}${e.stderr ?? ''}`.split('\n').slice(-15).join('\n')}`);
  }
}
