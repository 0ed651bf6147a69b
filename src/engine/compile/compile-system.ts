import type { PolynomialSystem } from '../expr/node.ts';
import { createTape, type TapeInstruction } from './tape.ts';
import { lowerExpression } from './lower.ts';
import { gradient } from './differentiate.ts';
import { generateSource, type ProgramOutputs } from './codegen.ts';
import { createFunctionCache } from './function-cache.ts';

/**
 * The sizes of a compiled system: neq equations, n unknowns, np parameters, and the parameters whose derivative
 * columns jp holds (all of 0…np−1 in order when omitted).
 */
export interface SystemShape {
  readonly neq: number;
  readonly n: number;
  readonly np: number;
  readonly derivativeParameters?: readonly number[];
}

/**
 * Evaluates F(x; p) and its derivatives. x (2n), p (2np) are packed complex; v (2neq) receives the values,
 * jx (2·neq·n, row-major) ∂F/∂x, jp (2·neq·k, row-major) ∂F/∂p for the k derivative parameters (default all np). Pass jx = null for values only, jp = null to
 * skip ∂F/∂p (jx null with jp given is not supported). Allocates nothing; exact up to one rounding per operation.
 */
export type SystemEvaluator = (x: Float64Array, p: Float64Array, v: Float64Array, jx: Float64Array | null, jp: Float64Array | null) => void;

/** A system compiled to one straight-line function; `source` rebuilds it anywhere (see compiledFromSource). */
export interface CompiledEquations extends SystemShape {
  readonly evaluate: SystemEvaluator;
  readonly source: string;
  /** The SSA program behind the source (present when compiled here, absent when rebuilt from source). */
  readonly program?: { readonly instructions: readonly TapeInstruction[]; readonly outputs: ProgramOutputs };
}

/**
 * Compiles a polynomial system (any number of equations) into one evaluator with values, ∂F/∂x by symbolic
 * reverse-mode differentiation, and ∂F/∂p, hash-consing identical subtrees (common-subexpression elimination).
 * Throws RangeError naming the equation when an unknown or parameter index is out of range.
 */
export function compileSystem(system: PolynomialSystem, options: { derivativeParameters?: readonly number[] } = {}): CompiledEquations {
  const n = system.unknowns.length, np = system.parameters.length, neq = system.equations.length;
  const tape = createTape();
  const memo = new Map();
  let where = 0;
  const leaves = {
    unknown: (i: number): number => {
      if (!Number.isInteger(i) || i < 0 || i >= n) throw new RangeError(`equation ${where}: unknown index ${i} is outside 0..${n - 1}`);
      return tape.unknown(i);
    },
    parameter: (i: number): number => {
      if (!Number.isInteger(i) || i < 0 || i >= np) throw new RangeError(`equation ${where}: parameter index ${i} is outside 0..${np - 1}`);
      return tape.parameter(i);
    },
  };
  const values: number[] = [];
  system.equations.forEach((e, i) => {
    where = i;
    values.push(lowerExpression(tape, e, leaves, memo));
  });
  const columns = options.derivativeParameters;
  columns?.forEach((k) => {
    if (!Number.isInteger(k) || k < 0 || k >= np) throw new RangeError(`derivative parameter ${k} is outside 0..${np - 1}`);
  });
  const jx: number[] = [], jp: number[] = [];
  for (const root of values) {
    const g = gradient(tape, root, n, np);
    jx.push(...g.dx);
    jp.push(...(columns ? columns.map((k) => g.dp[k]!) : g.dp));
  }
  const outputs = { values, jx, jp };
  const source = generateSource(tape.instructions, outputs);
  const shape: SystemShape = columns ? { neq, n, np, derivativeParameters: [...columns] } : { neq, n, np };
  return { ...compiledFromSource(source, shape), program: { instructions: tape.instructions, outputs } };
}

const evaluatorFor = createFunctionCache<SystemEvaluator>(32);

/**
 * Rebuilds a compiled system from its source text (as sent to a worker) and shape; no program attached.
 * Functions are cached by source text (the last 32), so a system of the same structure reuses warm, already
 * optimised code across solves and instances (the source carries no parameter values).
 */
export function compiledFromSource(source: string, shape: SystemShape): CompiledEquations {
  return { ...shape, evaluate: evaluatorFor(source), source };
}
