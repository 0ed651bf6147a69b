import type { Homotopy } from '../homotopy.ts';
import type { CompiledEquations } from '../compile/compile-system.ts';
import type { DoubleDoubleValuesEvaluator } from '../dd/compile-values.ts';
import { matVec } from '../complex/packed.ts';
import { gammaArc } from '../parameter/gamma-arc.ts';

/**
 * The coefficient-parameter homotopy H(x, t) = F(x; p(t)) of Morgan–Sommese (Appl. Math. Comput. 29, 1989)
 * on the segment p(t) = p0 + τ(t)·(p1 − p0). Without gamma τ = t; with gamma [re, im] the engine's one gamma-trick
 * convention, τ(t) = t / (γ(1 − t) + t) of parameter/gamma-arc.ts (the same arc as a ParameterLeg with that γ), which
 * keeps τ off the real segment for 0 < t < 1 while τ(0) = 0, τ(1) = 1. ∂H/∂t = J_p·(p1 − p0)·dτ/dt. The compiled
 * system must be square (neq = n). Buffers are made once. With `extended` (the double-double value evaluator of the
 * same program) it also offers evaluateValueExtended, with p(t) as computed in double taken as exact.
 */
export function parameterHomotopy(compiled: CompiledEquations, p0: Float64Array, p1: Float64Array, gamma?: ArrayLike<number>, extended?: DoubleDoubleValuesEvaluator): Homotopy {
  const { n, np, neq } = compiled;
  if (neq !== n) throw new RangeError(`parameter homotopy needs a square system, got ${neq} equations in ${n} unknowns`);
  if (p0.length !== 2 * np || p1.length !== 2 * np) throw new RangeError(`parameter vectors must have length ${2 * np} (packed complex)`);
  if (compiled.derivativeParameters && (compiled.derivativeParameters.length !== np || compiled.derivativeParameters.some((k, i) => k !== i))) {
    throw new RangeError('parameter homotopy needs ∂F/∂p for every parameter (compile without derivativeParameters)');
  }
  const p = new Float64Array(2 * np), dp = new Float64Array(2 * np), jp = new Float64Array(2 * neq * np);
  for (let i = 0; i < 2 * np; i++) dp[i] = p1[i]! - p0[i]!;
  const gRe = gamma ? gamma[0]! : 1, gIm = gamma ? gamma[1]! : 0;
  const tau = new Float64Array(4); // τ re, im, dτ/dt re, im
  const setTau = (tRe: number, tIm: number): void => {
    if (!gamma) { tau[0] = tRe; tau[1] = tIm; tau[2] = 1; tau[3] = 0; return; }
    gammaArc(tRe, tIm, gRe, gIm, tau);
  };
  const setParameters = (tRe: number, tIm: number): void => {
    setTau(tRe, tIm);
    const a = tau[0]!, b = tau[1]!;
    for (let k = 0; k < 2 * np; k += 2) {
      p[k] = p0[k]! + a * dp[k]! - b * dp[k + 1]!;
      p[k + 1] = p0[k + 1]! + a * dp[k + 1]! + b * dp[k]!;
    }
  };
  const zeros = new Float64Array(2 * n);
  const homotopy: Homotopy = {
    n,
    evaluate(x, tRe, tIm, h, jac, ht) {
      setParameters(tRe, tIm);
      compiled.evaluate(x, p, h, jac, jp);
      matVec(ht, jp, dp, neq, np);
      const a = tau[2]!, b = tau[3]!;
      for (let i = 0; i < 2 * n; i += 2) {
        const r = ht[i]!, m = ht[i + 1]!;
        ht[i] = a * r - b * m;
        ht[i + 1] = a * m + b * r;
      }
    },
    evaluateValue(x, tRe, tIm, h) {
      setParameters(tRe, tIm);
      compiled.evaluate(x, p, h, null, null);
    },
  };
  if (extended) {
    homotopy.evaluateValueExtended = (x, tRe, tIm, h) => {
      setParameters(tRe, tIm);
      extended(x, zeros, p, h, null);
    };
  }
  return homotopy;
}
