import { execFileSync, spawnSync } from 'node:child_process';
import { chmodSync, chownSync, existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { availableParallelism, hostname, tmpdir } from 'node:os';
import { join } from 'node:path';
import { setTimeout as pause } from 'node:timers/promises';
import { slurmConfText } from './slurm-conf-text.ts';

/** A running one-node cluster: the environment its clients need, and `stop` (ends only the daemons started here). */
export interface LocalSlurm {
  readonly env: Record<string, string>;
  readonly started: readonly string[];
  stop(): Promise<void>;
}

const MUNGE_KEY = '/etc/munge/munge.key';

/** Pids of live processes named exactly `name` (zombies left), read from /proc (a bare machine may lack pgrep). */
function running(name: string): number[] {
  return readdirSync('/proc').filter((d) => /^\d+$/.test(d)).filter((d) => {
    try {
      const m = /^\d+ \((.*)\) (\S)/.exec(readFileSync(`/proc/${d}/stat`, 'utf8'));
      return m !== null && m[1] === name && m[2] !== 'Z';
    } catch {
      return false; // the process ended while we looked
    }
  }).map(Number);
}

function pidFrom(file: string): number | undefined {
  const n = existsSync(file) ? Number(readFileSync(file, 'utf8').trim()) : NaN;
  return Number.isInteger(n) && n > 0 ? n : undefined;
}

function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

function mungeUser(): boolean {
  return spawnSync('id', ['-u', 'munge']).status === 0;
}

/** Creates the munge key (1024 random bytes, owner munge, mode 0400) when there is none. */
function ensureMungeKey(log: (line: string) => void): void {
  if (existsSync(MUNGE_KEY)) return;
  log('test:slurm: creating a munge key');
  mkdirSync('/etc/munge', { recursive: true, mode: 0o700 });
  writeFileSync(MUNGE_KEY, execFileSync('head', ['-c', '1024', '/dev/urandom']), { mode: 0o400 });
  if (mungeUser()) {
    const uid = Number(execFileSync('id', ['-u', 'munge'], { encoding: 'utf8' }));
    const gid = Number(execFileSync('id', ['-g', 'munge'], { encoding: 'utf8' }));
    chownSync('/etc/munge', uid, gid);
    chownSync(MUNGE_KEY, uid, gid);
  }
  chmodSync(MUNGE_KEY, 0o400);
}

/** Starts munged (as the munge user when there is one) and returns its pid. */
function startMunged(): number {
  const owner = mungeUser() ? ['runuser', '-u', 'munge', '--'] : [];
  for (const dir of ['/run/munge', '/var/log/munge', '/var/lib/munge']) {
    mkdirSync(dir, { recursive: true });
    if (owner.length) execFileSync('chown', ['munge:munge', dir]);
  }
  const [cmd, ...args] = [...owner, '/usr/sbin/munged', ...(owner.length ? [] : ['--force'])];
  execFileSync(cmd!, args, { stdio: 'pipe' });
  const pid = pidFrom('/run/munge/munged.pid');
  if (pid === undefined) throw new Error('test:slurm: munged started but wrote no pid file');
  return pid;
}

async function waitFor(what: string, seconds: number, ready: () => boolean): Promise<void> {
  for (let t = 0; t < seconds * 4; t++) {
    if (ready()) return;
    await pause(250);
  }
  throw new Error(`test:slurm: ${what} not ready after ${seconds} s`);
}

/**
 * Makes a one-node Slurm cluster available: uses the one already running (munged, slurmctld and slurmd all up),
 * else starts munged (if not running) and slurmctld and slurmd on a fresh slurm.conf in a temporary folder
 * (SLURM_CONF in `env`), and waits until the node is idle. `stop` terminates exactly the daemons it started.
 */
export async function startLocalSlurm(log: (line: string) => void): Promise<LocalSlurm> {
  const started: { name: string; pid: number }[] = [];
  const stop = async (): Promise<void> => {
    for (const { name, pid } of [...started].reverse()) {
      if (!alive(pid)) continue;
      process.kill(pid, 'SIGTERM');
      await waitFor(`stopping ${name}`, 15, () => !alive(pid)).catch(() => process.kill(pid, 'SIGKILL'));
    }
  };
  const ctld = running('slurmctld'), slurmd = running('slurmd');
  if (ctld.length > 0 || slurmd.length > 0) {
    if (ctld.length === 0 || slurmd.length === 0 || running('munged').length === 0) throw new Error('test:slurm: Slurm is half running here (slurmctld, slurmd and munged must all run, or none); not touching it');
    log('test:slurm: using the Slurm already running');
    const env: Record<string, string> = process.env.SLURM_CONF ? { SLURM_CONF: process.env.SLURM_CONF } : {};
    return { env, started: [], stop };
  }
  try {
    ensureMungeKey(log);
    if (running('munged').length === 0) started.push({ name: 'munged', pid: startMunged() });
    const dir = mkdtempSync(join(tmpdir(), 'atlas-slurm-'));
    for (const sub of ['state', 'spool']) mkdirSync(join(dir, sub));
    const conf = join(dir, 'slurm.conf');
    writeFileSync(conf, slurmConfText({ host: hostname().split('.')[0]!, cpus: availableParallelism(), dir }));
    const env = { SLURM_CONF: conf };
    execFileSync('/usr/sbin/slurmctld', ['-f', conf], { stdio: 'pipe' });
    await waitFor('slurmctld', 20, () => pidFrom(join(dir, 'slurmctld.pid')) !== undefined);
    started.push({ name: 'slurmctld', pid: pidFrom(join(dir, 'slurmctld.pid'))! });
    execFileSync('/usr/sbin/slurmd', ['-f', conf], { stdio: 'pipe' });
    await waitFor('slurmd', 20, () => pidFrom(join(dir, 'slurmd.pid')) !== undefined);
    started.push({ name: 'slurmd', pid: pidFrom(join(dir, 'slurmd.pid'))! });
    await waitFor('the node', 30, () => /idle/.test(spawnSync('sinfo', ['--noheader', '--format=%T'], { encoding: 'utf8', env: { ...process.env, ...env } }).stdout ?? ''));
    log(`test:slurm: started ${started.map((s) => s.name).join(', ')} (${conf})`);
    return {
      env,
      started: started.map((s) => s.name),
      stop: async () => {
        await stop();
        rmSync(dir, { recursive: true, force: true });
      },
    };
  } catch (error) {
    await stop();
    throw error;
  }
}
