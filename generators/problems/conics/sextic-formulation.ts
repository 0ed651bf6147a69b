import type { ExprNode, exprBuilders as ExprOps } from '../../../src/engine/index.ts';
import { multiply, plus, type ExprPolynomial } from '../shared/univariate.ts';
import { conicMatrix } from './conic-expr.ts';

type Ops = typeof ExprOps;

/**
 * The tangency condition of conics U and A: the discriminant of the binary cubic det(s·A + t·U), written with s = 1
 * as c₃t³ + c₂t² + c₁t + c₀: Δ = c₂²c₁² − 4c₃c₁³ − 4c₂³c₀ − 27c₃²c₀² + 18c₃c₂c₁c₀. Degree 6 in U and in A
 * (Salmon's tact-invariant); it also vanishes when U is a double line, which is where the naive count's excess goes.
 */
export function tangencyDiscriminant(ops: Ops, u: readonly ExprNode[], a: readonly ExprNode[]): ExprNode {
  const U = conicMatrix(ops, u), A = conicMatrix(ops, a);
  const m = A.map((row, i) => row.map((entry, j): ExprPolynomial => [entry, U[i]![j]!]));
  const minus = (p: ExprPolynomial, q: ExprPolynomial): ExprPolynomial => plus(ops, p, q.map((c) => (c ? ops.neg(c) : null)));
  const e = (i: number, j: number): ExprPolynomial => m[i]![j]!;
  const minor = (r0: number, r1: number, c0: number, c1: number): ExprPolynomial => minus(multiply(ops, e(r0, c0), e(r1, c1)), multiply(ops, e(r0, c1), e(r1, c0)));
  const det = plus(ops, minus(multiply(ops, e(0, 0), minor(1, 2, 1, 2)), multiply(ops, e(0, 1), minor(1, 2, 0, 2))), multiply(ops, e(0, 2), minor(1, 2, 0, 1)));
  const [k0, k1, k2, k3] = [0, 1, 2, 3].map((k) => det[k] ?? ops.constant(0)) as [ExprNode, ExprNode, ExprNode, ExprNode];
  return ops.add(
    ops.mul(ops.pow(k2, 2), ops.pow(k1, 2)),
    ops.mul(-4, k3, ops.pow(k1, 3)),
    ops.mul(-4, ops.pow(k2, 3), k0),
    ops.mul(-27, ops.pow(k3, 2), ops.pow(k0, 2)),
    ops.mul(18, k3, k2, k1, k0),
  );
}
