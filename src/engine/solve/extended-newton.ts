import type { CompiledEquations } from '../compile/compile-system.ts';
import { compileValuesInDoubleDouble, type DoubleDoubleValuesEvaluator } from '../dd/compile-values.ts';
import { roundDdToDouble, subtractFromDd } from '../dd/dd-vector.ts';
import { createDenseLU } from '../linalg/dense-lu.ts';
import type { SystemScaling } from '../start/scaling.ts';

/** Newton steps tried in double-double. */
const ITERATIONS = 8;
/** A step this small (relative, natural units) is double-double accuracy: the iteration converged. */
const CONVERGED = 1e-26;
/** Each step must be at most this fraction of the previous one: far faster than the halving at a double root. */
const FAST = 1e-3;

/**
 * Newton's method on F(·; parameters) with the state x and the residual F(x) in double-double (about 32 digits)
 * and the Jacobian and its LU in double: iterative refinement, which converges with rate κ·2⁻⁵³ per step at a
 * nonsingular solution of condition κ < 2⁵³ (Wilkinson; Moler, J. ACM 14, 1967) but only linearly (halving and
 * slower) at a singular one. Returns whether x lies in the basin of a nonsingular solution: a step reached 1e-26
 * (relative, natural units) within 8, each step at most 10⁻³ of the one before; `point` is the last iterate
 * rounded to double. The double-double evaluator is generated on first use. Buffers are made once.
 */
export function createExtendedNewton(compiled: CompiledEquations, parameters: Float64Array, scaling: SystemScaling): (x: Float64Array) => { nonsingular: boolean; point: Float64Array } {
  const { n, neq } = compiled;
  const units = Float64Array.from(scaling.variables, (c) => 2 ** c);
  let extended: DoubleDoubleValuesEvaluator | null = null;
  const hi = new Float64Array(2 * n), lo = new Float64Array(2 * n), v = new Float64Array(2 * neq), jac = new Float64Array(2 * neq * n), dx = new Float64Array(2 * n);
  const lu = createDenseLU(n);
  return (x) => {
    if (!compiled.program) throw new Error('extended Newton needs the compiled program (compile the system here, not from source)');
    extended ??= compileValuesInDoubleDouble(compiled.program).evaluate;
    hi.set(x);
    lo.fill(0);
    let previous = Infinity, nonsingular = false;
    for (let it = 0; it < ITERATIONS; it++) {
      compiled.evaluate(hi, parameters, v, jac, null);
      if (!Number.isFinite(lu.factor(jac))) break;
      extended(hi, lo, parameters, v, null);
      lu.solve(v, dx);
      let d = 0, s = 0;
      for (let j = 0; j < n; j++) {
        d = Math.max(d, Math.hypot(dx[2 * j]!, dx[2 * j + 1]!) / units[j]!);
        s = Math.max(s, Math.hypot(hi[2 * j]!, hi[2 * j + 1]!) / units[j]!);
      }
      const step = d / (1 + s);
      if (!(step === step) || (it > 0 && step > FAST * previous && step > CONVERGED)) break;
      subtractFromDd(hi, lo, dx, n);
      if (step <= CONVERGED) { nonsingular = true; break; }
      previous = step;
    }
    const point = new Float64Array(2 * n);
    roundDdToDouble(point, hi, lo, n);
    return { nonsingular, point };
  };
}
