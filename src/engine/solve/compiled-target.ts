import type { PolynomialSystem } from '../expr/node.ts';
import { compileSystem, type CompiledEquations } from '../compile/compile-system.ts';

const cache = new WeakMap<PolynomialSystem, CompiledEquations>();

/** compileSystem(system), compiled once per system object (weakly cached: the system's lifetime bounds the cache). */
export function compiledTarget(system: PolynomialSystem): CompiledEquations {
  let compiled = cache.get(system);
  if (compiled === undefined) {
    compiled = compileSystem(system);
    cache.set(system, compiled);
  }
  return compiled;
}
