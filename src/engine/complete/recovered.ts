import type { CompiledEquations } from '../compile/compile-system.ts';
import { createAffineTools } from '../solve/affine.ts';

/** A solution at the instance that the given set lacked, Newton-refined there. */
export interface RecoveredSolution {
  /** The affine unknowns (packed complex). */
  readonly point: Float64Array;
  /** ‖F(x; p₀)‖∞ / (1 + ‖x‖∞) after refinement. */
  readonly residual: number;
  /** κ₁ estimate of ∂F/∂x there. */
  readonly condition: number;
}

/** Refinement: Newton to a correction ≤ 1e-13 (relative), ≤ 5 iterations; accepted at residual ≤ 1e-8 and condition ≤ 1e14. */
const NEWTON_TOLERANCE = 1e-13, NEWTON_ITERATIONS = 5, RESIDUAL_LIMIT = 1e-8, CONDITION_LIMIT = 1e14;

/**
 * Refines candidate solutions of F(·; parameters) by Newton's method (copies; relative correction 1e-13, ≤ 5 steps)
 * and keeps those with residual ≤ 1e-8 and condition ≤ 1e14 (the limits solveSystem applies to its ends), sorted by
 * their coordinates rounded to 9 significant digits. `rejected` counts the candidates that failed those limits.
 */
export function refineRecovered(compiled: CompiledEquations, parameters: Float64Array, candidates: readonly Float64Array[]): { recovered: RecoveredSolution[]; rejected: number } {
  const tools = createAffineTools(compiled, parameters);
  const recovered: RecoveredSolution[] = [];
  let rejected = 0;
  for (const c of candidates) {
    const point = c.slice();
    tools.newton(point, NEWTON_TOLERANCE, NEWTON_ITERATIONS);
    const residual = tools.residual(point), condition = tools.condition(point);
    if (residual <= RESIDUAL_LIMIT && condition <= CONDITION_LIMIT) recovered.push({ point, residual, condition });
    else rejected++;
  }
  return { recovered: recovered.sort((a, b) => byRoundedCoordinates(a.point, b.point)), rejected };
}

/** Orders points by (re, im, …) of each coordinate rounded to 9 significant digits, so that round-off cannot flip the order. */
export function byRoundedCoordinates(a: Float64Array, b: Float64Array): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) {
    const x = Number(a[i]!.toPrecision(9)), y = Number(b[i]!.toPrecision(9));
    if (x !== y) return x - y;
  }
  return a.length - b.length;
}
