import type { Homotopy } from '../homotopy.ts';
import { compiledFromSource, type SystemShape } from '../compile/compile-system.ts';
import { parameterHomotopy } from './parameter-homotopy.ts';
import { withProjectiveGroups } from './projective-groups.ts';

/** Structured-cloneable description of a parameter homotopy over a compiled system (sent to workers as is). */
export interface CompiledHomotopyArgs {
  readonly source: string;
  readonly shape: SystemShape;
  readonly p0: Float64Array;
  readonly p1: Float64Array;
  readonly gamma?: Float64Array;
  /** Multiprojective groups (coordinate indices, homogenising coordinate last) for the at-infinity test. */
  readonly projectiveGroups?: readonly (readonly number[])[];
}

/** Pool homotopy module: rebuilds the compiled system from source text and returns parameterHomotopy over it. */
export function createHomotopy(args: CompiledHomotopyArgs): Homotopy {
  const h = parameterHomotopy(compiledFromSource(args.source, args.shape), args.p0, args.p1, args.gamma);
  return args.projectiveGroups ? withProjectiveGroups(h, args.projectiveGroups) : h;
}

/** The file URL of this module, for pool jobs. */
export const COMPILED_HOMOTOPY_MODULE: string = import.meta.url;
