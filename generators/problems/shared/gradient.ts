import type { ExprNode } from '../../../src/engine/index.ts';
import type { Ops } from './expression-ops.ts';

/**
 * The partial derivatives of the homogenisation F(v₀, …, vₙ) of Σ c·Π vᵢ^eᵢ (total degree `degree`, exponents over
 * the first n variables, vₙ the homogenising one) evaluated on the chart vₙ = 1: n + 1 expressions of degree
 * degree − 1 in the n chart variables. Exact (built symbolically).
 */
export function gradientOnChart(ops: Ops, coefficients: readonly ExprNode[], exponents: readonly (readonly number[])[], degree: number, variables: readonly ExprNode[]): ExprNode[] {
  const homogeneous = exponents.map((e) => [...e, degree - e.reduce((s, k) => s + k, 0)]);
  const partial = (u: number): ExprNode => {
    const terms: ExprNode[] = [];
    homogeneous.forEach((e, m) => {
      if (e[u] === 0) return;
      const lowered = e.map((k, i) => (i === u ? k - 1 : k));
      terms.push(ops.mul(e[u]!, coefficients[m]!, ...variables.flatMap((v, i) => (lowered[i]! > 0 ? [ops.pow(v, lowered[i]!)] : []))));
    });
    return ops.add(...terms);
  };
  return homogeneous[0]!.map((_, u) => partial(u));
}
