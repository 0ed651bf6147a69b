import type { ExprNode } from './node.ts';

/**
 * The total degree of an expression in the unknowns whose indices are in `within` (all unknowns when omitted).
 * An upper bound read off the graph (cancellation is not detected), which is what Bézout bounds use.
 * Constants and parameters have degree 0; the zero constant has degree 0 too.
 */
export function degree(node: ExprNode, within?: ReadonlySet<number>, memo = new Map<ExprNode, number>()): number {
  const cached = memo.get(node);
  if (cached !== undefined) return cached;
  let d: number;
  switch (node.kind) {
    case 'const':
    case 'param':
      d = 0;
      break;
    case 'unknown':
      d = within === undefined || within.has(node.index) ? 1 : 0;
      break;
    case 'add':
      d = 0;
      for (const t of node.terms) d = Math.max(d, degree(t, within, memo));
      break;
    case 'mul':
      d = 0;
      for (const f of node.factors) d += degree(f, within, memo);
      break;
    case 'neg':
      d = degree(node.arg, within, memo);
      break;
    case 'pow':
      d = node.exponent * degree(node.base, within, memo);
      break;
  }
  memo.set(node, d);
  return d;
}

/** The degree of each equation in each variable group: result[i][g] = degree of equation i in group g. */
export function groupDegrees(equations: readonly ExprNode[], groups: readonly (readonly number[])[]): number[][] {
  const sets = groups.map((g) => new Set(g));
  return equations.map((e) => sets.map((s) => degree(e, s)));
}
