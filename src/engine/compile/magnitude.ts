import type { TapeInstruction } from './tape.ts';
import type { CompiledEquations } from './compile-system.ts';

/** Fills m (length neq) with m_i = |f_i|(|x|, |p|): real, allocates nothing. */
export type MagnitudeEvaluator = (x: Float64Array, p: Float64Array, m: Float64Array) => void;

/**
 * Writes the JavaScript source of `function (x, p, m)` that evaluates each value output of the tape with every
 * constant, unknown and parameter replaced by its modulus, every sum and difference by the sum of the moduli,
 * every product by the product and negation dropped: m_i = |f_i|(|x|, |p|) ≥ |f_i(x; p)|. For a polynomial written
 * as a sum of terms this is Σ |c_α|·|x^α|; for any graph it is the quantity that bounds the rounding error of
 * evaluating f_i as written (|fl(f_i) − f_i| ≤ γ_k·m_i, k the graph's depth; Higham, Accuracy and Stability of
 * Numerical Algorithms, 2nd ed. 2002, §3.1 and §5.1), so |f_i(x)| / m_i is a backward error of x for equation i.
 */
export function generateMagnitudeSource(ins: readonly TapeInstruction[], values: readonly number[]): string {
  const needed = new Uint8Array(ins.length);
  const stack = [...values];
  while (stack.length > 0) {
    const id = stack.pop()!;
    if (needed[id]) continue;
    needed[id] = 1;
    const { op, a, b } = ins[id]!;
    if (op === 'add' || op === 'sub' || op === 'mul') stack.push(a, b);
    else if (op === 'neg') stack.push(a);
  }
  const ref = (id: number): string => {
    const i = ins[id]!;
    return i.op === 'const' ? String(Math.hypot(i.re, i.im)) : `m${id}`;
  };
  const body: string[] = ['"use strict";', 'return function magnitudes(x, p, m) {'];
  for (let id = 0; id < ins.length; id++) {
    if (!needed[id]) continue;
    const { op, a, b } = ins[id]!;
    if (op === 'x') body.push(`const m${id} = Math.sqrt(x[${2 * a}] * x[${2 * a}] + x[${2 * a + 1}] * x[${2 * a + 1}]);`);
    else if (op === 'p') body.push(`const m${id} = Math.sqrt(p[${2 * a}] * p[${2 * a}] + p[${2 * a + 1}] * p[${2 * a + 1}]);`);
    else if (op === 'add' || op === 'sub') body.push(`const m${id} = ${ref(a)} + ${ref(b)};`);
    else if (op === 'mul') body.push(`const m${id} = ${ref(a)} * ${ref(b)};`);
    else if (op === 'neg') body.push(`const m${id} = ${ref(a)};`);
  }
  values.forEach((id, k) => body.push(`m[${k}] = ${ref(id)};`));
  body.push('};');
  return body.join('\n');
}

const cache = new WeakMap<CompiledEquations, MagnitudeEvaluator>();

/** The magnitude evaluator of a system compiled here (it needs compiled.program); built once per compiled system. */
export function compileMagnitudes(compiled: CompiledEquations): MagnitudeEvaluator {
  let evaluate = cache.get(compiled);
  if (evaluate === undefined) {
    if (!compiled.program) throw new Error('magnitudes need the compiled program (compile the system here, not from source)');
    evaluate = new Function(generateMagnitudeSource(compiled.program.instructions, compiled.program.outputs.values))() as MagnitudeEvaluator;
    cache.set(compiled, evaluate);
  }
  return evaluate;
}
