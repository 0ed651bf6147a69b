import type { PathEnd } from '../homotopy.ts';
import { projectiveInfinityDistance } from '../homotopies/projective-groups.ts';
import type { AffineTools } from './affine.ts';
import { distInf, normInf } from '../complex/packed.ts';

/** A singular end is re-judged nonsingular when ‖F(x)‖∞ / (1 + ‖x‖∞) ≤ this and κ(∂F/∂x) ≤ CLEARLY_NONSINGULAR. */
export const AFFINE_RESIDUAL = 1e-8;
/**
 * Far below the tracker's singular threshold (1e10): points of positive-dimensional solution sets show condition
 * estimates of 1e9–1e11 in double precision, so only a clearly nonsingular Jacobian overrides a singular verdict.
 */
const CLEARLY_NONSINGULAR = 1e6;
/**
 * A 'regular' end must solve the target: after Newton (relative 1e-13, ≤ 5 iterations) its residual is
 * ≤ AFFINE_RESIDUAL and its condition κ₁(∂F/∂x) ≤ this (κ·2⁻⁵² ≈ 1e-2: beyond it no digit of x is trustworthy).
 */
export const SANE_CONDITION = 1e14;
/** Newton may move a regular end at most this far (relative): farther, it found some other point. */
const NEWTON_MOVE = 1e-6;
/** A 'regular' end that fails the solve test within this relative distance of infinity (the endgame's divergence radius) is at infinity. */
const NEAR_INFINITY = 0.02;

/**
 * Turns a path end in multiprojective homotopy coordinates (groups: coordinate indices, homogenising one last)
 * into the target's coordinates: finite ends become x_j = X_j / h_g(j) with the affine residual and condition;
 * 'at-infinity' ends (and failed ends with some h_g = 0) carry the direction (X_0 … X_{n−1}) / max_j |X_j|
 * and keep the homotopy's residual and condition. A 'singular' finite end is re-judged on the target itself:
 * residual ≤ 1e-8 and condition ≤ 1e6 make it 'regular' (winding number 1). (A singular end close to infinity
 * stays 'singular': a slowly diverging path and a far finite singular point cannot be told apart here.)
 * A 'regular' end is kept only if it solves the target (see solvesTarget: Newton moves it ≤ 1e-6 relative to a
 * residual ≤ 1e-8 and condition ≤ 1e14); otherwise it is 'at-infinity' within relative distance 0.02 of infinity in the homotopy's
 * charts (a path the endgame stopped short of infinity), else 'failed' with reason 'no-convergence'.
 */
export function toAffineEnd(end: PathEnd, groups: readonly (readonly number[])[], n: number, tools: AffineTools): PathEnd {
  const X = end.point;
  const x = new Float64Array(2 * n);
  let finite = end.outcome !== 'at-infinity';
  for (const g of groups) {
    const h = g[g.length - 1]!;
    const hr = X[2 * h]!, hi = X[2 * h + 1]!, d = hr * hr + hi * hi;
    if (!(d > 0) || !Number.isFinite(d)) finite = false;
    for (const j of g.slice(0, -1)) {
      x[2 * j] = (X[2 * j]! * hr + X[2 * j + 1]! * hi) / d;
      x[2 * j + 1] = (X[2 * j + 1]! * hr - X[2 * j]! * hi) / d;
    }
  }
  if (finite && x.every(Number.isFinite)) {
    const residual = tools.residual(x), condition = tools.condition(x);
    if (end.outcome === 'regular' && !solvesTarget(x, tools)) {
      if (projectiveInfinityDistance(X, groups) <= NEAR_INFINITY) return direction({ ...end, outcome: 'at-infinity' }, X, n);
      return { ...end, outcome: 'failed', failure: 'no-convergence', point: x, residual, condition };
    }
    if (end.outcome === 'singular' && residual <= AFFINE_RESIDUAL && condition <= CLEARLY_NONSINGULAR) {
      // nonsingular after all (the projective chart was badly scaled there): winding number 1, implicit function theorem
      return { ...end, outcome: 'regular', windingNumber: 1, point: x, residual, condition };
    }
    return { ...end, point: x, residual, condition };
  }
  return direction(end, X, n);
}

/**
 * true when Newton from (a copy of) x (relative 1e-13, ≤ 5 iterations, as collectSolutions refines) stays within
 * relative 1e-6 of x and reaches residual ≤ AFFINE_RESIDUAL with condition ≤ SANE_CONDITION.
 */
function solvesTarget(x: Float64Array, tools: AffineTools): boolean {
  const refined = Float64Array.from(x);
  tools.newton(refined, 1e-13, 5);
  return distInf(refined, x) <= NEWTON_MOVE * (1 + normInf(x)) && tools.residual(refined) <= AFFINE_RESIDUAL && tools.condition(refined) <= SANE_CONDITION;
}

/** The end with its point replaced by the direction (X_0 … X_{n−1}) / max_j |X_j|. */
function direction(end: PathEnd, X: Float64Array, n: number): PathEnd {
  const x = new Float64Array(2 * n);
  let m = 0;
  for (let j = 0; j < n; j++) m = Math.max(m, Math.hypot(X[2 * j]!, X[2 * j + 1]!));
  for (let i = 0; i < 2 * n; i++) x[i] = m > 0 ? X[i]! / m : X[i]!;
  return { ...end, point: x };
}
