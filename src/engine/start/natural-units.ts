import type { PolynomialSystem } from '../expr/node.ts';
import { expandSystem, ExpansionTooLarge } from '../expr/expand.ts';
import { coefficientScaling, noScaling, type SystemScaling } from './scaling.ts';

const cache = new WeakMap<PolynomialSystem, Map<string, SystemScaling>>();

/**
 * The system's natural units at these parameter values: the coefficient scaling of its expanded form
 * (coefficientScaling), or no scaling when the expanded form would pass 20000 terms per intermediate polynomial.
 * Deterministic (a function of the system and the parameter values only), cached per system and parameter values,
 * so a merge of shards recomputes exactly what each shard used.
 */
export function naturalUnits(system: PolynomialSystem, parameters: Float64Array): SystemScaling {
  let bySystem = cache.get(system);
  if (!bySystem) cache.set(system, (bySystem = new Map()));
  const key = Array.from(parameters).join(',');
  let scaling = bySystem.get(key);
  if (!scaling) {
    try {
      scaling = coefficientScaling(expandSystem(system, parameters), system.unknowns.length);
    } catch (error) {
      if (!(error instanceof ExpansionTooLarge)) throw error;
      scaling = noScaling(system.unknowns.length, system.equations.length);
    }
    bySystem.set(key, scaling);
  }
  return scaling;
}

/** The packed complex unit vector u with u_j = 2^variables[j] (as a plain array of per-unknown factors). */
export function unitFactors(scaling: SystemScaling): Float64Array {
  return Float64Array.from(scaling.variables, (c) => 2 ** c);
}
