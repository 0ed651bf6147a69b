import type { FormulationDefinition } from '../../../src/atlas/definition.ts';
import type { ExprNode } from '../../../src/engine/index.ts';
import { coefficientNames, monomialExponents } from '../shared/monomials.ts';
import { polynomial } from '../shared/form.ts';

type Ops = Parameters<FormulationDefinition['equations']>[2];

/** Exponents [i, j] of the cubic's monomials xⁱyʲ, highest degree first (x³, x²y, xy², y³, x², …, 1). */
export const CUBIC_EXPONENTS = monomialExponents(2, 3);
/** Coefficient names c30, c21, … c00 in CUBIC_EXPONENTS order; c30 (of x³) is fixed to 1, the rest are unknowns. */
export const CUBIC_NAMES = coefficientNames('c', 2, 3);
/** The unknown coefficients (every one but c30). */
export const UNKNOWN_COEFFICIENTS = CUBIC_NAMES.slice(1);

/** The cubic's coefficient nodes in CUBIC_NAMES order: the constant 1 for x³, then the unknowns. */
export function cubicCoefficients(u: Readonly<Record<string, ExprNode>>, ops: Ops): ExprNode[] {
  return [ops.constant(1), ...UNKNOWN_COEFFICIENTS.map((n) => u[n]!)];
}

/** The cubic f(x, y) = Σ c_ij xⁱyʲ at the given point (nodes). */
export function cubicAt(ops: Ops, c: readonly ExprNode[], x: ExprNode, y: ExprNode): ExprNode {
  return polynomial(ops, c, CUBIC_EXPONENTS, [x, y]);
}

/**
 * The three partial derivatives of the homogenised cubic F(x, y, z) on the chart z = 1: ∂F/∂x, ∂F/∂y and
 * ∂F/∂z = Σ (3 − i − j) c_ij xⁱyʲ; each is linear in the coefficients and of degree 2 in (x, y). They vanish
 * together exactly at a singular point of the curve in the chart (Euler: 3F = xF_x + yF_y + zF_z).
 */
export function cubicGradient(ops: Ops, c: readonly ExprNode[], x: ExprNode, y: ExprNode): ExprNode[] {
  const derivative = (weight: (e: readonly number[]) => number, shift: (e: readonly number[]) => number[]) => {
    const kept = CUBIC_EXPONENTS.map((e, m) => ({ w: weight(e), e: shift(e), c: c[m]! })).filter((t) => t.w !== 0);
    return polynomial(ops, kept.map((t) => ops.mul(t.w, t.c)), kept.map((t) => t.e), [x, y]);
  };
  return [
    derivative((e) => e[0]!, (e) => [e[0]! - 1, e[1]!]),
    derivative((e) => e[1]!, (e) => [e[0]!, e[1]! - 1]),
    derivative((e) => 3 - e[0]! - e[1]!, (e) => [...e]),
  ];
}
