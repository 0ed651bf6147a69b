import type { ExprNode } from '../../../src/engine/index.ts';
import type { Ops } from '../shared/expression-ops.ts';
import { multiply, substitute, type ExprPolynomial } from '../shared/univariate.ts';

/** The unknowns of a line of the chart A·(t, mt + k) touching a plane curve of degree d at the roots of t² + αt + β. */
export interface ChartBitangent {
  readonly m: ExprNode;
  readonly k: ExprNode;
  readonly alpha: ExprNode;
  readonly beta: ExprNode;
  /** γ₁ … γ_{d−4}: the monic residual factor t^{d−4} + γ₁t^{d−5} + … + γ_{d−4} (empty for a quartic). */
  readonly residual: readonly ExprNode[];
}

/**
 * The d equations "f restricted to the line (x, y) = A·(t, mt + k), A = [[1, −σ], [σ, 1]], equals its leading
 * coefficient times (t² + αt + β)²·(t^{d−4} + γ₁t^{d−5} + … + γ_{d−4})", one per power t^{d−1} … t⁰; exact
 * (built symbolically), of degree d in (m, k) and 2 + (d − 4) in the remaining unknowns. Needs d ≥ 4.
 */
export function bitangentEquations(ops: Ops, coefficients: readonly ExprNode[], exponents: readonly (readonly number[])[], degree: number, sigma: ExprNode, line: ChartBitangent): ExprNode[] {
  if (degree < 4 || line.residual.length !== degree - 4) throw new Error(`bitangentEquations: degree ${degree} needs ${Math.max(0, degree - 4)} residual unknowns, got ${line.residual.length}`);
  const x: ExprPolynomial = [ops.neg(ops.mul(sigma, line.k)), ops.sub(1, ops.mul(sigma, line.m))];
  const y: ExprPolynomial = [line.k, ops.add(sigma, line.m)];
  const restricted = substitute(ops, coefficients, exponents, [x, y]);
  const leading = restricted[degree];
  if (!leading || restricted.length !== degree + 1) throw new Error(`bitangentEquations: the restriction to the line is not of degree ${degree}`);
  const one = ops.constant(1);
  const contact: ExprPolynomial = [line.beta, line.alpha, one];
  const residual: ExprPolynomial = [...[...line.residual].reverse(), one];
  const shape = multiply(ops, multiply(ops, contact, contact), residual);
  return Array.from({ length: degree }, (_, i) => {
    const power = degree - 1 - i;
    const q = restricted[power];
    if (!q) throw new Error(`bitangentEquations: the coefficient of t^${power} vanished identically`);
    return ops.sub(q, ops.mul(shape[power]!, leading));
  });
}

/** The point A·(t, mt + k) of the plane for a real chart σ: (t − σ(mt + k), σt + mt + k). */
export function pointOnChartLine(sigma: number, m: number, k: number, t: number): [number, number] {
  const y = m * t + k;
  return [t - sigma * y, sigma * t + y];
}
