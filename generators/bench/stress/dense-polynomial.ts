import { exprBuilders, type ExprNode } from '../../../src/engine/index.ts';
import { monomialExponents } from '../../problems/shared/monomials.ts';
import type { CoefficientSource } from './coefficient-source.ts';

const { add, mul, pow } = exprBuilders;

/**
 * Σ c_α · Π coordinates[j]^α_j over every monomial of total degree ≤ degree in the given coordinate nodes (highest
 * degree first, see monomialExponents), each c_α a fresh coefficient of the source. The coordinates may be any
 * nodes (unknowns, scaled unknowns, linear forms), so one builder serves every change of coordinates.
 */
export function densePolynomial(coordinates: readonly ExprNode[], degree: number, source: CoefficientSource): ExprNode {
  return add(...monomialExponents(coordinates.length, degree).map((alpha) => {
    const powers = alpha.flatMap((k, j) => (k === 0 ? [] : [k === 1 ? coordinates[j]! : pow(coordinates[j]!, k)]));
    return mul(source.coefficient(), ...powers);
  }));
}
