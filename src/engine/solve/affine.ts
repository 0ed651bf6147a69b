import type { CompiledEquations } from '../compile/compile-system.ts';
import { createDenseLU } from '../linalg/dense-lu.ts';
import { normInf } from '../complex/packed.ts';

/** Residual, condition and Newton's method for a square compiled system at fixed parameters; buffers made once. */
export interface AffineTools {
  /** ‖F(x)‖∞ / (1 + ‖x‖∞). */
  residual(x: Float64Array): number;
  /** κ₁ estimate of ∂F/∂x at x (Infinity when singular or not finite). */
  condition(x: Float64Array): number;
  /**
   * Newton's method in place until a correction ≤ tol·(1 + ‖x‖∞); stops (false) after maxIterations, or when a
   * correction fails to halve, restoring the best iterate. true when converged.
   */
  newton(x: Float64Array, tol: number, maxIterations: number): boolean;
}

/** Creates AffineTools for F(·; parameters). */
export function createAffineTools(compiled: CompiledEquations, parameters: Float64Array): AffineTools {
  const { n } = compiled;
  const v = new Float64Array(2 * n), jac = new Float64Array(2 * n * n), dx = new Float64Array(2 * n), best = new Float64Array(2 * n);
  const lu = createDenseLU(n);
  const residual = (x: Float64Array): number => {
    compiled.evaluate(x, parameters, v, null, null);
    return normInf(v) / (1 + normInf(x));
  };
  return {
    residual,
    condition(x) {
      compiled.evaluate(x, parameters, v, jac, null);
      return lu.factor(jac);
    },
    newton(x, tol, maxIterations) {
      let previous = Infinity;
      best.set(x);
      let bestResidual = residual(x);
      for (let it = 0; it < maxIterations; it++) {
        compiled.evaluate(x, parameters, v, jac, null);
        if (!Number.isFinite(lu.factor(jac))) break;
        lu.solve(v, dx);
        const delta = normInf(dx) / (1 + normInf(x));
        if (!(delta === delta) || (it > 0 && delta > 0.5 * previous && delta > tol)) break;
        for (let i = 0; i < 2 * n; i++) x[i] = x[i]! - dx[i]!;
        const r = residual(x);
        if (r <= bestResidual) { bestResidual = r; best.set(x); }
        if (delta <= tol) return true;
        previous = delta;
      }
      x.set(best);
      return false;
    },
  };
}
