import { invertComplex, multiplyComplex } from './complex-inverse.ts';
import type { PointWorkspace } from './point-workspace.ts';

/**
 * For solutions too ill-conditioned for double-precision residuals: two Newton steps m ← m − J(m)⁻¹F(m) from
 * ws.centre with F(m) evaluated exactly (so the residual is not drowned in rounding noise), then a fresh
 * Y = J(m)⁻¹ in ws.inverse. Real: the centre's imaginary parts are kept at 0. False when the Jacobian turns singular.
 */
export function refineExactly(ws: PointWorkspace, real: boolean): boolean {
  const { n, system, centre, values, jacobian, inverse, centreValues, step } = ws;
  for (let iteration = 0; iteration < 3; iteration++) {
    if (real) for (let j = 0; j < n; j++) centre[2 * j + 1] = 0;
    system.pointJacobian(centre, values, jacobian);
    if (!invertComplex(jacobian, n, inverse)) return false;
    if (iteration === 2) return true;
    system.exactValues(centre, centreValues);
    for (let k = 0; k < 2 * n; k++) values[k] = 0.5 * centreValues[2 * k]! + 0.5 * centreValues[2 * k + 1]!;
    multiplyComplex(inverse, values, n, step);
    for (let k = 0; k < 2 * n; k++) centre[k] = centre[k]! - step[k]!;
  }
  return true;
}
