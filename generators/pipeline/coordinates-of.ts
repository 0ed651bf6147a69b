import type { ProblemDefinition } from '../../src/atlas/definition.ts';
import { AtlasError } from './atlas-error.ts';

/**
 * The record's values of one solution: `formulation.coordinates.map(point)` (packed complex, one per coordinate
 * name) or the point itself. Throws an AtlasError naming the field when the map fails or returns a wrong length
 * or a non-finite value.
 */
export function coordinatesOf(definition: ProblemDefinition, point: Float64Array, where: string): Float64Array {
  const chart = definition.formulation.coordinates;
  if (!chart) return point;
  let values: unknown;
  try {
    values = chart.map(Float64Array.from(point));
  } catch (error) {
    throw new AtlasError('input', `${where}: formulation.coordinates.map: threw ${error instanceof Error ? error.message : String(error)}`);
  }
  if (!(values instanceof Float64Array && values.length === 2 * chart.names.length && values.every(Number.isFinite))) {
    throw new AtlasError('input', `${where}: formulation.coordinates.map: must return a Float64Array of ${2 * chart.names.length} finite numbers (packed complex, one per name)`);
  }
  return values;
}

/** Whether packed complex values are real: every |im| ≤ 1e-8·(1 + |re|). The tolerance suits refined solutions. */
export function isRealValues(values: Float64Array, tolerance = 1e-8): boolean {
  for (let k = 0; k < values.length; k += 2) if (Math.abs(values[k + 1]!) > tolerance * (1 + Math.abs(values[k]!))) return false;
  return true;
}
