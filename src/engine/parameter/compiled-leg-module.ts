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
 * system: the engine's parameterHomotopy, whose gamma is the leg's γ (one convention, gamma-arc.ts).
 */
export function createHomotopy(args: CompiledLegConstants & { from: Float64Array; to: Float64Array; gamma: readonly [number, number] }): Homotopy {
  return parameterHomotopy(compiledFromSource(args.source, args.shape), args.from, args.to, args.gamma);
}

/** The file URL of this module, for HomotopyModuleRef.url. */
export const COMPILED_LEG_MODULE: string = import.meta.url;
