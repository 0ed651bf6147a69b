import { compileSystem, createInProcessLegTracker, createRandom, discoverByMonodromy, parameterHomotopy, type MonodromyResult } from '../../../src/engine/index.ts';
import { systemOf } from '../../../src/atlas/system-of.ts';
import rationalCubics from './rational-cubics-through-8-points.ts';
import { parametrisedCubicFormulation, parametrisedSeed } from './parametrised-cubic.ts';

/**
 * Rational cubics through eight points found as parametrised maps by monodromy (Duff et al. 2019) from a
 * solution-first seed drawn from `seed`, without being told the count: discovery runs until added nodes bring nothing
 * new. Returns the engine's result (parameters of the best node, its solutions, why it stopped).
 */
export async function cubicsByMonodromy(seed: number): Promise<MonodromyResult> {
  const system = systemOf({ ...rationalCubics, slug: 'rational-cubics-parametrised', formulation: parametrisedCubicFormulation });
  const compiled = compileSystem(system);
  const random = createRandom(seed);
  const start = parametrisedSeed(random);
  // The engine's parameter homotopy takes 1/γ to trace the arc of gamma-arc.ts (as compiled-leg-module.ts does).
  const track = createInProcessLegTracker(({ from, to, gamma: [gr, gi] }) => parameterHomotopy(compiled, from, to, Float64Array.of(gr / (gr * gr + gi * gi), -gi / (gr * gr + gi * gi))));
  return discoverByMonodromy({ track, seed: start, random });
}
