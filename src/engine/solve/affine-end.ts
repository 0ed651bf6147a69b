import type { PathEnd } from '../homotopy.ts';
import type { SystemScaling } from '../start/scaling.ts';
import type { AffineTools } from './affine.ts';
import { ENDPOINT_RESIDUAL } from '../track/cauchy-endgame.ts';

/**
 * A finite end solves the target when its backward error (AffineTools.residual: max_i |f_i(x)| / |f_i|(|x|)) is at
 * most this after Newton's refinement. Genuine ends reach 1e-16 to 1e-14 (a few roundings per term); ends that do not
 * solve the target sit at 1e-6 and above, so six orders of magnitude separate the two.
 */
export const SOLVED_BACKWARD_ERROR = 1e-10;
/**
 * Far below the tracker's singular threshold (1e10): points of positive-dimensional solution sets show condition
 * estimates of 1e9–1e11 in double precision, so only a clearly nonsingular Jacobian overrides a singular verdict.
 */
const CLEARLY_NONSINGULAR = 1e6;
/** A regular end's Jacobian condition κ₁ in natural units must be at most this (κ·2⁻⁵² ≈ 1e-2: past it no digit of x is trustworthy). */
export const SANE_CONDITION = 1e14;
/** Newton may move a regular end at most this far (relative, natural units): farther, it found some other point. */
const NEWTON_MOVE = 1e-6;

/**
 * Turns a path end in multiprojective homotopy coordinates (groups: coordinate indices, homogenising one last; the
 * unknowns in natural units y, see planHomotopy) into the target's unknowns x = 2^c ⊙ y. A 'regular' end (nonsingular
 * in the homotopy's charts, and not at infinity to within its accuracy: the tracker decides that) is finite however
 * large, and it is kept 'regular' only if it solves the target: Newton (relative 1e-13 in natural units, ≤ 5 iterations) moves
 * it ≤ 1e-6 to a backward error ≤ SOLVED_BACKWARD_ERROR with κ ≤ 1e14; else it is 'at-infinity' when it solves the
 * homogenised target (the tracker's residual ≤ ENDPOINT_RESIDUAL: a nonsingular root whose homogenising coordinate
 * the affine coordinates cannot tell from zero), or 'failed' ('no-convergence'), for the solver to re-track. A
 * 'singular' or 'failed' finite end that Newton (relative 1e-13, ≤ 5 iterations) moves ≤ 1e-6 to a backward error ≤
 * SOLVED_BACKWARD_ERROR with κ ≤ 1e6 is re-judged 'regular' (the projective chart was badly scaled there: measured on a
 * dense sextic system, an end of affine κ 8.8 had κ 7e10 in its chart). (A singular end's backward error says little: at a double
 * root the attainable accuracy is 2⁻²⁶, where x² has backward error near 1; undecided singular ends are re-tracked by
 * the solver's review instead.) 'at-infinity' ends (and ends with some h_g = 0) carry the
 * direction (Y_0 … Y_{n−1}) / max_j |Y_j| in natural units. Residuals of finite ends are backward errors.
 */
export function toAffineEnd(end: PathEnd, groups: readonly (readonly number[])[], scaling: SystemScaling, tools: AffineTools): PathEnd {
  const X = end.point;
  const n = scaling.variables.length;
  const x = new Float64Array(2 * n);
  let finite = end.outcome !== 'at-infinity';
  for (const g of groups) {
    const h = g[g.length - 1]!;
    const hr = X[2 * h]!, hi = X[2 * h + 1]!, d = hr * hr + hi * hi;
    if (!(d > 0) || !Number.isFinite(d)) finite = false;
    for (const j of g.slice(0, -1)) {
      const u = 2 ** scaling.variables[j]!;
      x[2 * j] = (u * (X[2 * j]! * hr + X[2 * j + 1]! * hi)) / d;
      x[2 * j + 1] = (u * (X[2 * j + 1]! * hr - X[2 * j]! * hi)) / d;
    }
  }
  if (!finite || !x.every(Number.isFinite)) return direction(end, X, n);
  if (end.outcome === 'regular') {
    const refined = Float64Array.from(x);
    tools.newton(refined, 1e-13, 5);
    const residual = tools.residual(refined), condition = tools.condition(refined);
    if (tools.distance(x, refined) <= NEWTON_MOVE && residual <= SOLVED_BACKWARD_ERROR && condition <= SANE_CONDITION) return { ...end, point: x, residual: tools.residual(x), condition };
    // a nonsingular root of the homogenised target whose dehomogenisation solves nothing: its homogenising coordinate
    // is zero to within what the affine coordinates can resolve (a nonsingular solution at infinity)
    if (end.residual <= ENDPOINT_RESIDUAL) return direction({ ...end, outcome: 'at-infinity' }, X, n);
    return { ...end, outcome: 'failed', failure: 'no-convergence', point: x, residual: tools.residual(x), condition: tools.condition(x) };
  }
  const residual = tools.residual(x), condition = tools.condition(x);
  if ((end.outcome === 'singular' || end.outcome === 'failed') && clearlyNonsingular(x, tools)) {
    // nonsingular after all (the projective chart was badly scaled there): winding number 1 by the implicit function theorem
    const { failure: _, ...rest } = end;
    return { ...rest, outcome: 'regular', windingNumber: 1, point: x, residual, condition };
  }
  return { ...end, point: x, residual, condition };
}

/** Newton from (a copy of) x stays within 1e-6 and reaches backward error ≤ SOLVED_BACKWARD_ERROR with κ ≤ CLEARLY_NONSINGULAR. */
function clearlyNonsingular(x: Float64Array, tools: AffineTools): boolean {
  if (!(tools.residual(x) <= 1e-6)) return false;
  const refined = Float64Array.from(x);
  tools.newton(refined, 1e-13, 5);
  return tools.distance(x, refined) <= NEWTON_MOVE && tools.residual(refined) <= SOLVED_BACKWARD_ERROR && tools.condition(refined) <= CLEARLY_NONSINGULAR;
}

/** The end with its point replaced by the direction (Y_0 … Y_{n−1}) / max_j |Y_j| (natural units). */
function direction(end: PathEnd, X: Float64Array, n: number): PathEnd {
  const x = new Float64Array(2 * n);
  let m = 0;
  for (let j = 0; j < n; j++) m = Math.max(m, Math.hypot(X[2 * j]!, X[2 * j + 1]!));
  for (let i = 0; i < 2 * n; i++) x[i] = m > 0 ? X[i]! / m : X[i]!;
  return { ...end, point: x, direction: true };
}
