import type { TapeInstruction } from '../compile/tape.ts';
import { createFunctionCache } from '../compile/function-cache.ts';
import { generateDoubleDoubleValuesSource } from './values-codegen.ts';

/**
 * Evaluates a system's values in double-double: x = xhi + xlo (packed complex, length 2n each, normalised pairs),
 * p packed complex doubles; writes v (2·neq) = the values rounded to double and, unless vlo is null, vlo = the
 * exact remainders (v + vlo is the double-double result). Allocates nothing. Error per real part: see
 * values-codegen.ts (a few u² = 2⁻¹⁰⁶ times the size of the terms each operation combines).
 */
export type DoubleDoubleValuesEvaluator = (xhi: Float64Array, xlo: Float64Array, p: Float64Array, v: Float64Array, vlo: Float64Array | null) => void;

/** The double-double value evaluator of a program and its source text (which rebuilds it on a worker). */
export interface DoubleDoubleValues {
  readonly source: string;
  readonly evaluate: DoubleDoubleValuesEvaluator;
}

/** The part of a compiled program the double-double evaluator needs: the tape and its value outputs. */
export interface ValuesProgram {
  readonly instructions: readonly TapeInstruction[];
  readonly outputs: { readonly values: readonly number[] };
}

/** Generates the double-double values evaluator of a program (`compileSystem(…).program`); throws RangeError for a constant whose split overflows (|c| above about 1.3e300) in a product. */
export function compileValuesInDoubleDouble(program: ValuesProgram): DoubleDoubleValues {
  return doubleDoubleValuesFromSource(generateDoubleDoubleValuesSource(program.instructions, program.outputs.values));
}

const evaluatorFor = createFunctionCache<DoubleDoubleValuesEvaluator>(32);

/** Rebuilds the evaluator from its source text (as sent to a worker); functions are cached by source (the last 32). */
export function doubleDoubleValuesFromSource(source: string): DoubleDoubleValues {
  return { source, evaluate: evaluatorFor(source) };
}
