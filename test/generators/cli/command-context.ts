import type { CommandContext, Sink } from '../../../generators/command/context.ts';
import type { EngineServices } from '../../../generators/pipeline/engine-services.ts';
import { fakeEngine } from '../pipeline/fixtures/fake-engine.ts';

/** A buffer that collects what a command writes. */
export function buffer(isTTY = false): Sink & { text: string } {
  const sink = { text: '', isTTY, write(t: string) { sink.text += t; } };
  return sink;
}

/** An in-process command context over the fake engine, counting how often the engine is loaded. */
export function fakeContext(options: { engine?: () => EngineServices; problemsDir?: string } = {}) {
  const stdout = buffer(), stderr = buffer();
  let loads = 0;
  const engine = options.engine ?? (() => fakeEngine());
  const ctx: CommandContext = {
    stdout, stderr, problemsDir: options.problemsDir, now: () => 0,
    loadEngine: async () => (loads++, engine()),
    engineVersion: async () => engine().version,
  };
  return { ctx, stdout, stderr, loads: () => loads };
}
