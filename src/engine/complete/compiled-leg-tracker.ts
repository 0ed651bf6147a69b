import type { CompiledEquations } from '../compile/compile-system.ts';
import type { TrackingPool } from '../pool/job.ts';
import type { TrackerSettings } from '../track/settings.ts';
import { COMPILED_LEG_MODULE } from '../parameter/compiled-leg-module.ts';
import { createModuleLegTracker } from '../parameter/module-tracker.ts';
import { createPoolLegTracker } from '../parameter/pool-tracker.ts';
import type { LegTracker } from '../parameter/route.ts';

/**
 * A LegTracker for parameter legs of a compiled square system (the engine's parameterHomotopy, gamma as in
 * gamma-arc.ts): over `pool` when given, else on this thread. Ends come back in start order either way, so results
 * do not depend on where paths run.
 */
export function compiledLegTracker(compiled: CompiledEquations, pool?: TrackingPool, settings: Partial<TrackerSettings> = {}): Promise<LegTracker> {
  const ref = { url: COMPILED_LEG_MODULE, constants: { source: compiled.source, shape: { neq: compiled.neq, n: compiled.n, np: compiled.np } } };
  return pool ? Promise.resolve(createPoolLegTracker(pool, ref, settings)) : createModuleLegTracker(ref, settings);
}
