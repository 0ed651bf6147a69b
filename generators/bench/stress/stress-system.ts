import { exprBuilders, type PolynomialSystem } from '../../../src/engine/index.ts';
import { coefficientSource } from './coefficient-source.ts';
import type { CoordinateChange } from './coordinate-change.ts';
import type { StressFamily } from './stress-family.ts';

const { param, unknown } = exprBuilders;

/** One system of the stress corpus: a family member at one seed, after one change of coordinates. */
export interface StressSystem {
  /** "<family> · <change> · seed <s>", unique within the corpus. */
  readonly name: string;
  readonly seed: number;
  readonly system: PolynomialSystem;
  /** The values of system.parameters (packed complex): the change's data (a linear change's matrix), then the coefficients. */
  readonly parameters: Float64Array;
  /** Isolated nonsingular solutions a complete solve finds (the family's count; a change of coordinates keeps it). */
  readonly expected: number;
  readonly reason: string;
  /** Maps a solution of the family's base system at the same seed to the corresponding solution of this one. */
  readonly fromBase: (point: Float64Array) => Float64Array;
}

/**
 * Builds family member `seed` (coefficients from coefficientSource(seed), so every change of coordinates shares
 * them) in the coordinates the change puts in place of the unknowns x1 … xn. Parameters: the change's, then c0, c1, ….
 */
export function stressSystem(family: StressFamily, change: CoordinateChange, seed: number): StressSystem {
  const names = Array.from({ length: family.unknowns }, (_, j) => `x${j + 1}`);
  const data = change.parameterNames.map((name, k) => param(name, k));
  const source = coefficientSource(seed, data.length);
  const equations = family.equations(change.coordinates(names.map((name, j) => unknown(name, j)), data), source);
  const system: PolynomialSystem = { unknowns: names, parameters: [...change.parameterNames, ...source.names()], equations };
  const parameters = new Float64Array(change.parameterValues.length + source.values().length);
  parameters.set(change.parameterValues);
  parameters.set(source.values(), change.parameterValues.length);
  return {
    name: `${family.label} · ${change.label} · seed ${seed}`,
    seed,
    system,
    parameters,
    expected: family.expected,
    reason: family.reason,
    fromBase: change.fromBase,
  };
}
