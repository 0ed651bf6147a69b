import type { Homotopy } from '../homotopy.ts';
import type { CompiledEquations } from '../compile/compile-system.ts';
import type { DoubleDoubleValuesEvaluator } from '../dd/compile-values.ts';

/**
 * H(x, t) = F(x; t, q): parameter 0 of the compiled system is the path parameter t itself and the others are
 * held at `rest` (packed complex, length 2(np − 1)). The system must be square and compiled with
 * derivativeParameters [0], so jp is ∂H/∂t. Used for start-system homotopies whose random data (γ, charts,
 * forms) are parameters, so the compiled code is shared by every solve of the same structure. With `extended` (the
 * double-double value evaluator of the same program) the homotopy also offers evaluateValueExtended.
 */
export function firstParameterHomotopy(compiled: CompiledEquations, rest: Float64Array, extended?: DoubleDoubleValuesEvaluator): Homotopy {
  const { n, np, neq } = compiled;
  if (neq !== n) throw new RangeError(`homotopy needs a square system, got ${neq} equations in ${n} unknowns`);
  if (rest.length !== 2 * (np - 1)) throw new RangeError(`fixed parameters must have length ${2 * (np - 1)}, got ${rest.length}`);
  if (!compiled.derivativeParameters || compiled.derivativeParameters.length !== 1 || compiled.derivativeParameters[0] !== 0) {
    throw new RangeError('compile the system with derivativeParameters [0] (∂F/∂t only)');
  }
  const p = new Float64Array(2 * np);
  p.set(rest, 2);
  const zeros = new Float64Array(2 * n);
  const homotopy: Homotopy = {
    n,
    evaluate(x, tRe, tIm, h, jac, ht) {
      p[0] = tRe;
      p[1] = tIm;
      compiled.evaluate(x, p, h, jac, ht);
    },
    evaluateValue(x, tRe, tIm, h) {
      p[0] = tRe;
      p[1] = tIm;
      compiled.evaluate(x, p, h, null, null);
    },
  };
  if (extended) {
    homotopy.evaluateValueExtended = (x, tRe, tIm, h) => {
      p[0] = tRe;
      p[1] = tIm;
      extended(x, zeros, p, h, null);
    };
  }
  return homotopy;
}
