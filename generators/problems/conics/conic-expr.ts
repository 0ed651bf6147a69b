import type { ExprNode, exprBuilders as ExprOps } from '../../../src/engine/index.ts';

type Ops = typeof ExprOps;

/** The symmetric matrix [[a, b/2, d/2], [b/2, c, e/2], [d/2, e/2, f]] of a conic from its six coefficient nodes. */
export function conicMatrix(ops: Ops, [a, b, c, d, e, f]: readonly ExprNode[]): ExprNode[][] {
  const half = (v: ExprNode | undefined): ExprNode => ops.mul(0.5, v!);
  return [
    [a!, half(b), half(d)],
    [half(b), c!, half(e)],
    [half(d), half(e), f!],
  ];
}

/** M·P for a 3×3 matrix and a 3-vector of nodes. */
export function matVec(ops: Ops, m: readonly (readonly ExprNode[])[], p: readonly ExprNode[]): ExprNode[] {
  return m.map((row) => ops.dot(row, p));
}

/** The value of the conic at the point (x, y, z): a·x² + b·xy + c·y² + d·xz + e·yz + f·z². */
export function conicAt(ops: Ops, [a, b, c, d, e, f]: readonly ExprNode[], [x, y, z]: readonly ExprNode[]): ExprNode {
  return ops.add(
    ops.mul(a!, x!, x!), ops.mul(b!, x!, y!), ops.mul(c!, y!, y!),
    ops.mul(d!, x!, z!), ops.mul(e!, y!, z!), ops.mul(f!, z!, z!),
  );
}
