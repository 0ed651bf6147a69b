import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const CLI = fileURLToPath(new URL('../../../generators/cli.ts', import.meta.url));

/** The outcome of one run of the command as a maintainer runs it. */
export interface CliRun {
  readonly code: number;
  readonly stdout: string;
  readonly stderr: string;
}

/** Runs `node --experimental-strip-types generators/cli.ts …args` in a child process (no TTY) and collects its output. */
export function runCli(args: readonly string[], env: Record<string, string> = {}): Promise<CliRun> {
  return new Promise((resolve) => {
    execFile(process.execPath, ['--experimental-strip-types', CLI, ...args], { env: { ...process.env, ...env }, maxBuffer: 1 << 24 }, (error, stdout, stderr) => {
      const code = error ? (typeof error.code === 'number' ? error.code : -1) : 0;
      resolve({ code, stdout, stderr });
    });
  });
}
