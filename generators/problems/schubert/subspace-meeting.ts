import type { FormulationDefinition } from '../../../src/atlas/definition.ts';
import type { ExprNode } from '../../../src/engine/index.ts';

type Ops = Parameters<FormulationDefinition['equations']>[2];

/** The k-element subsets of {0, …, n − 1} in lexicographic order. */
function subsets(n: number, k: number): number[][] {
  if (k === 0) return [[]];
  const out: number[][] = [];
  for (let first = 0; first <= n - k; first++) for (const rest of subsets(n - first - 1, k - 1)) out.push([first, ...rest.map((r) => r + first + 1)]);
  return out;
}

/**
 * The determinant of the n × n matrix stacking `top` (k rows) over `bottom` (n − k rows), by Laplace expansion along
 * the top rows: Σ_S ± det(top_S) · det(bottom_{S'}) over the k-subsets S of the columns (S' the complement). It
 * vanishes exactly when the row spaces meet nontrivially. The top minors are the Plücker coordinates of the top
 * row space, so the expression is linear in them; exact (no numerics). With `omit`, the term of that column subset
 * is left out (the caller accounts for it).
 */
export function meetingDeterminant(ops: Ops, top: readonly (readonly ExprNode[])[], bottom: readonly (readonly ExprNode[])[], omit?: readonly number[]): ExprNode {
  const k = top.length, n = k + bottom.length;
  const omitted = (S: readonly number[]) => omit !== undefined && S.length === omit.length && S.every((j, i) => j === omit[i]);
  const terms = subsets(n, k).filter((S) => !omitted(S)).map((S) => {
    const rest = Array.from({ length: n }, (_, j) => j).filter((j) => !S.includes(j));
    const sign = (S.reduce((s, j) => s + j, 0) - (k * (k - 1)) / 2) % 2 === 0 ? 1 : -1;
    const minor = (rows: readonly (readonly ExprNode[])[], cols: number[]) => (cols.length === 0 ? ops.constant(1) : ops.det(rows.map((row) => cols.map((j) => row[j]!))));
    const product = ops.mul(minor(top, S), minor(bottom, rest));
    return sign > 0 ? product : ops.neg(product);
  });
  return ops.add(...terms);
}
