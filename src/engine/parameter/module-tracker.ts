import type { Homotopy } from '../homotopy.ts';
import type { TrackerSettings } from '../track/settings.ts';
import type { ParameterLeg } from './gamma-arc.ts';
import { createInProcessLegTracker } from './in-process-tracker.ts';
import type { LegTracker } from './route.ts';

/**
 * A parameter-homotopy module: a file URL whose module exports createHomotopy(args) for
 * args = { ...constants, from, to, gamma } (one leg; see gamma-arc.ts), plus the constants (structured-cloneable).
 */
export interface HomotopyModuleRef {
  readonly url: string;
  readonly constants: Readonly<Record<string, unknown>>;
  /** Tracker settings this problem wants (over the defaults; a caller's own settings override these). */
  readonly settings?: Partial<TrackerSettings>;
}

/** The args a module's createHomotopy receives for one leg. */
export function legArgs(ref: HomotopyModuleRef, leg: ParameterLeg): Record<string, unknown> {
  return { ...ref.constants, from: leg.from, to: leg.to, gamma: leg.gamma };
}

/** A LegTracker on this thread that loads the module once (dynamic import) and tracks with the engine's tracker. */
export async function createModuleLegTracker(ref: HomotopyModuleRef, settings: Partial<TrackerSettings> = {}): Promise<LegTracker> {
  const mod = (await import(ref.url)) as { createHomotopy?: (args: Record<string, unknown>) => Homotopy };
  const create = mod.createHomotopy;
  if (typeof create !== 'function') throw new Error(`homotopy module ${ref.url} does not export createHomotopy(args)`);
  return createInProcessLegTracker((leg) => create(legArgs(ref, leg)), { ...ref.settings, ...settings });
}
