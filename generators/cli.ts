import { loadEngine } from './pipeline/real-engine.ts';
import { runCommand } from './command/run-command.ts';
import type { EngineServices } from './pipeline/engine-services.ts';

// The maintainer's command: `node --experimental-strip-types generators/cli.ts <command> …` (see HELP in
// generators/command/run-command.ts). Exit codes: 0 ok, 1 solve failed or worse result refused, 2 bad input,
// 3 corrupt content, 4 internal error. Worker threads the engine started are ended once the command is done.
const loaded: EngineServices[] = [];
const code = await runCommand(process.argv.slice(2), {
  stdout: process.stdout,
  stderr: process.stderr,
  loadEngine: async () => { const engine = await loadEngine(); loaded.push(engine); return engine; },
  engineVersion: async () => (await import('../src/engine/index.ts')).ENGINE_VERSION,
  now: () => performance.now(),
});
await Promise.all(loaded.map((engine) => engine.close?.()));
process.exitCode = code;
