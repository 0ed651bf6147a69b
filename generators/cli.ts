import { loadEngine } from './pipeline/real-engine.ts';
import { runCommand } from './command/run-command.ts';

// The maintainer's command: `node --experimental-strip-types generators/cli.ts <command> …` (see HELP in
// generators/command/run-command.ts). Exit codes: 0 ok, 1 solve failed or worse result refused, 2 bad input,
// 3 corrupt content, 4 internal error.
const code = await runCommand(process.argv.slice(2), {
  stdout: process.stdout,
  stderr: process.stderr,
  loadEngine,
  engineVersion: async () => (await import('../src/engine/version.ts')).ENGINE_VERSION,
  now: () => performance.now(),
});
process.exitCode = code;
