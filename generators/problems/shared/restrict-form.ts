import type { ExprNode, exprBuilders as ExprOps } from '../../../src/engine/index.ts';
import { multiply, plus, type ExprPolynomial } from './univariate.ts';

type Ops = typeof ExprOps;

/**
 * Σ coefficients[m]·Π variables[i]^exponents[m][i] collected by powers of s, for variables that are polynomials in
 * s (the restriction of a form to a parametrised line). Same result as `substitute`, but the products of the
 * variables are built once per exponent prefix and shared between monomials, and each coefficient multiplies only
 * the finished monomial, so the expression graph stays small for forms with many terms (a quintic in five variables).
 */
export function restrictForm(ops: Ops, coefficients: readonly ExprNode[], exponents: readonly (readonly number[])[], variables: readonly ExprPolynomial[]): ExprPolynomial {
  const products = new Map<string, ExprPolynomial>([['', [ops.constant(1)]]]);
  const productOf = (e: readonly number[], upTo: number): ExprPolynomial => {
    const key = e.slice(0, upTo).join(',');
    const known = products.get(key);
    if (known) return known;
    // Peel one factor off the last variable with a positive exponent in the prefix.
    let last = upTo - 1;
    while (last >= 0 && e[last] === 0) last--;
    const smaller = e.slice(0, upTo).map((k, i) => (i === last ? k - 1 : k));
    const value = last < 0 ? [ops.constant(1)] : multiply(ops, productOf(smaller, upTo), variables[last]!);
    products.set(key, value);
    return value;
  };
  let sum: ExprPolynomial = [];
  exponents.forEach((e, m) => {
    const monomial = productOf(e, e.length);
    sum = plus(ops, sum, monomial.map((t) => (t ? ops.mul(coefficients[m]!, t) : null)));
  });
  return sum;
}
