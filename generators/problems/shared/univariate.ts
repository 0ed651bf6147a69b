import type { ExprNode, exprBuilders as ExprOps } from '../../../src/engine/index.ts';

/**
 * A polynomial in one auxiliary variable whose coefficients are expressions: entry k is the coefficient of s^k,
 * null for an exact zero (kept out of the graph so that degrees and evaluation stay lean).
 */
export type ExprPolynomial = (ExprNode | null)[];

type Ops = typeof ExprOps;

/** p·q with expression coefficients; zeros stay null. */
export function multiply(ops: Ops, p: ExprPolynomial, q: ExprPolynomial): ExprPolynomial {
  const terms: ExprNode[][] = Array.from({ length: p.length + q.length - 1 }, () => []);
  p.forEach((a, i) => q.forEach((b, j) => { if (a && b) terms[i + j]!.push(ops.mul(a, b)); }));
  return terms.map((t) => (t.length === 0 ? null : ops.add(...t)));
}

/** p + q with expression coefficients. */
export function plus(ops: Ops, p: ExprPolynomial, q: ExprPolynomial): ExprPolynomial {
  return Array.from({ length: Math.max(p.length, q.length) }, (_, k) => {
    const a = p[k] ?? null;
    const b = q[k] ?? null;
    return a && b ? ops.add(a, b) : (a ?? b);
  });
}

/**
 * Substitutes polynomials in s for the variables of Σ coefficients[m]·Π vᵢ^exponents[m][i] and collects the
 * result by powers of s: the coefficient equations of "this curve or surface contains that parametrised line".
 */
export function substitute(ops: Ops, coefficients: readonly ExprNode[], exponents: readonly (readonly number[])[], variables: readonly ExprPolynomial[]): ExprPolynomial {
  let sum: ExprPolynomial = [];
  exponents.forEach((e, m) => {
    let term: ExprPolynomial = [coefficients[m]!];
    e.forEach((power, i) => { for (let k = 0; k < power; k++) term = multiply(ops, term, variables[i]!); });
    sum = plus(ops, sum, term);
  });
  return sum;
}
