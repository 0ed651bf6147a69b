import type { Homotopy } from '../homotopy.ts';
import { compiledFromSource, type SystemShape } from '../compile/compile-system.ts';
import { parameterHomotopy } from '../homotopies/parameter-homotopy.ts';

/** Constants of a compiled system for this module (structured-cloneable): its source text and shape. */
export interface CompiledLegConstants {
  readonly source: string;
  readonly shape: SystemShape;
}

/**
 * Parameter-homotopy module (the { ...constants, from, to, gamma } convention of module-tracker.ts) over any compiled
 * system: the engine's parameterHomotopy with its gamma set to 1/γ, which traces the same arc as gamma-arc.ts.
 */
export function createHomotopy(args: CompiledLegConstants & { from: Float64Array; to: Float64Array; gamma: readonly [number, number] }): Homotopy {
  const [gr, gi] = args.gamma;
  const d = gr * gr + gi * gi;
  return parameterHomotopy(compiledFromSource(args.source, args.shape), args.from, args.to, Float64Array.of(gr / d, -gi / d));
}

/** The file URL of this module, for HomotopyModuleRef.url. */
export const COMPILED_LEG_MODULE: string = import.meta.url;
