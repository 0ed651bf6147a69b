import type { PathEnd } from '../homotopy.ts';
import type { AffineTools } from './affine.ts';

/**
 * Turns a path end in multiprojective homotopy coordinates (groups: coordinate indices, homogenising one last)
 * into the target's coordinates: finite ends become x_j = X_j / h_g(j) with the affine residual and condition;
 * 'at-infinity' ends (and failed ends with some h_g = 0) carry the direction (X_0 … X_{n−1}) / max_j |X_j|
 * and keep the homotopy's residual and condition.
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
    return { ...end, point: x, residual: tools.residual(x), condition: tools.condition(x) };
  }
  let m = 0;
  for (let j = 0; j < n; j++) m = Math.max(m, Math.hypot(X[2 * j]!, X[2 * j + 1]!));
  for (let i = 0; i < 2 * n; i++) x[i] = m > 0 ? X[i]! / m : X[i]!;
  return { ...end, point: x };
}
