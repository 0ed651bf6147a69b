import { compiledFromSource, doubleDoubleValuesFromSource, parameterHomotopy, type Homotopy, type SystemShape } from '../../../src/engine/index.ts';

/** Module constants of the charted-map system: its compiled source and shape and its double-double values source. */
export interface ChartedMapLegConstants {
  readonly source: string;
  readonly shape: SystemShape;
  readonly extendedSource: string;
}

/**
 * Parameter-homotopy module (the { ...constants, from, to, gamma } convention of the engine's module tracker) over the
 * charted-map system with its double-double value evaluator, so that trackers set to precision 'double-double' correct
 * in extended precision (solutions near a degenerate map have conditions up to about 1e11 in binary64).
 */
export function createHomotopy(args: ChartedMapLegConstants & { from: Float64Array; to: Float64Array; gamma: readonly [number, number] }): Homotopy {
  return parameterHomotopy(compiledFromSource(args.source, args.shape), args.from, args.to, args.gamma, doubleDoubleValuesFromSource(args.extendedSource).evaluate);
}

/** The file URL of this module, for HomotopyModuleRef.url. */
export const CHARTED_MAP_LEG_MODULE: string = import.meta.url;
