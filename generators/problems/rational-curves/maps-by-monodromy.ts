import { createInProcessLegTracker, createRandom, discoverByMonodromy, type MonodromyOptions, type MonodromyResult } from '../../../src/engine/index.ts';
import { systemOf } from '../../../src/atlas/system-of.ts';
import type { ProblemDefinition } from '../../../src/atlas/definition.ts';
import { chartedToShown } from './charted-map.ts';
import { mapStoreSpec } from './map-store.ts';
import { parametrisedMapFormulation } from './parametrised-map.ts';

/** The parametrised-map system of degree d (parametrised-map.ts, α = 1) as the engine's polynomial system. */
export function parametrisedMapSystem(degree: number) {
  return systemOf({ slug: `rational-maps-of-degree-${degree}`, formulation: parametrisedMapFormulation(degree, '') } as ProblemDefinition);
}

/**
 * Rational plane curves of degree d through 3d − 1 points found as parametrised maps by monodromy (Duff et al. 2019)
 * from the solution-first seed and random chart of mapStoreSpec(d, seed), tracked on this thread in that chart. Without
 * `expected` in `options`, discovery runs until added nodes bring nothing new (it is not told the count). Returns the
 * engine's result with the solutions in the shown unknowns (α = 1; mapUnknowns order).
 */
export async function mapsByMonodromy(degree: number, seed: number, options: Partial<Omit<MonodromyOptions, 'track' | 'seed' | 'random'>> = {}): Promise<MonodromyResult> {
  const spec = mapStoreSpec(degree, seed, 0);
  const random = createRandom(seed);
  const { chart, parameters, solution } = spec.seedBuilder(random);
  const constants = spec.homotopy.constants(chart);
  const track = createInProcessLegTracker((leg) => spec.homotopy.create({ ...constants, ...leg }), spec.homotopy.settings);
  const result = await discoverByMonodromy({ ...options, track, seed: { parameters, solution }, random });
  return { ...result, solutions: result.solutions.map((x) => chartedToShown(degree, x)) };
}
