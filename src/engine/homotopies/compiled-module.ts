import type { Homotopy } from '../homotopy.ts';
import { compiledFromSource, type SystemShape } from '../compile/compile-system.ts';
import { parameterHomotopy } from './parameter-homotopy.ts';
import { firstParameterHomotopy } from './first-parameter-homotopy.ts';
import { withProjectiveGroups } from './projective-groups.ts';
import { doubleDoubleValuesFromSource } from '../dd/compile-values.ts';

/**
 * Structured-cloneable description of a homotopy over a compiled system (sent to workers as is): either the
 * segment p0 → p1 (parameterHomotopy, optional gamma) or, with `fixed`, parameter 0 as t and the rest fixed
 * (firstParameterHomotopy).
 */
export type CompiledHomotopyArgs = {
  readonly source: string;
  readonly shape: SystemShape;
  /** Multiprojective groups (coordinate indices, homogenising coordinate last) for the distance to infinity. */
  readonly projectiveGroups?: readonly (readonly number[])[];
  /** The double-double value evaluator's source of the same program (compileValuesInDoubleDouble), for extended precision. */
  readonly extendedSource?: string;
} & ({ readonly p0: Float64Array; readonly p1: Float64Array; readonly gamma?: readonly [number, number] } | { readonly fixed: Float64Array });

/** Pool homotopy module: rebuilds the compiled system from source text (cached) and returns the homotopy. */
export function createHomotopy(args: CompiledHomotopyArgs): Homotopy {
  const compiled = compiledFromSource(args.source, args.shape);
  const extended = args.extendedSource === undefined ? undefined : doubleDoubleValuesFromSource(args.extendedSource).evaluate;
  const h = 'fixed' in args ? firstParameterHomotopy(compiled, args.fixed, extended) : parameterHomotopy(compiled, args.p0, args.p1, args.gamma, extended);
  return args.projectiveGroups ? withProjectiveGroups(h, args.projectiveGroups) : h;
}

/** The file URL of this module, for pool jobs. */
export const COMPILED_HOMOTOPY_MODULE: string = import.meta.url;
