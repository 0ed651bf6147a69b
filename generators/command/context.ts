import type { EngineServices } from '../pipeline/engine-services.ts';

/** A text sink: stdout or stderr (or a test buffer); `isTTY` selects \r progress over plain lines. */
export interface Sink {
  write(text: string): void;
  readonly isTTY?: boolean;
}

/** What a command runs against: output sinks, the engine (loaded on first use), the problems folder, the clock. */
export interface CommandContext {
  readonly stdout: Sink;
  readonly stderr: Sink;
  readonly loadEngine: () => Promise<EngineServices>;
  /** The engine version alone, without loading the engine (staleness checks stay fast). */
  readonly engineVersion: () => Promise<string>;
  readonly problemsDir?: string;
  readonly now: () => number;
}
