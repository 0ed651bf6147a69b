import type { ExprNode } from '../expr/node.ts';
import { mul, pow, unknown } from '../expr/build.ts';
import { degree } from '../expr/degree.ts';

/**
 * Multihomogenises expressions: unknown j keeps index j, group g gets the homogenising coordinate with index
 * n + g, and every term of a sum is multiplied by h_g^(D_g(sum) − D_g(term)), so each result is homogeneous of
 * degree D_g(f) (the graph's upper bound) in group g. Each parameter node is replaced by `parameter(node)`
 * (a renumbered parameter, say). Shared nodes stay shared (memo by identity).
 */
export function multihomogenize(
  equations: readonly ExprNode[],
  groups: readonly (readonly number[])[],
  n: number,
  parameter: (node: ExprNode & { kind: 'param' }) => ExprNode,
): ExprNode[] {
  const sets = groups.map((g) => new Set(g));
  const degreeMemos = groups.map(() => new Map<ExprNode, number>());
  const degrees = (node: ExprNode): number[] => sets.map((s, g) => degree(node, s, degreeMemos[g]));
  const h = groups.map((_, g) => unknown(`h${g}`, n + g));
  const memo = new Map<ExprNode, ExprNode>();
  const hom = (node: ExprNode): ExprNode => {
    const cached = memo.get(node);
    if (cached) return cached;
    let out: ExprNode;
    switch (node.kind) {
      case 'const':
      case 'unknown':
        out = node;
        break;
      case 'param':
        out = parameter(node);
        break;
      case 'add': {
        const total = degrees(node);
        out = {
          kind: 'add',
          terms: node.terms.map((t) => {
            const d = degrees(t);
            const pad = total.flatMap((D, g) => (D > d[g]! ? [pow(h[g]!, D - d[g]!)] : []));
            return pad.length === 0 ? hom(t) : mul(hom(t), ...pad);
          }),
        };
        break;
      }
      case 'mul':
        out = { kind: 'mul', factors: node.factors.map(hom) };
        break;
      case 'neg':
        out = { kind: 'neg', arg: hom(node.arg) };
        break;
      case 'pow':
        out = { kind: 'pow', base: hom(node.base), exponent: node.exponent };
        break;
    }
    memo.set(node, out);
    return out;
  };
  return equations.map(hom);
}
