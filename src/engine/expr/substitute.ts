import type { ExprNode } from './node.ts';

/**
 * Rebuilds the equations with every unknown node replaced by `replace(node)` (called once per distinct unknown
 * node; shared subgraphs stay shared, memo by identity). Other leaves are kept as they are.
 */
export function substituteUnknowns(equations: readonly ExprNode[], replace: (node: ExprNode & { kind: 'unknown' }) => ExprNode): ExprNode[] {
  const memo = new Map<ExprNode, ExprNode>();
  const walk = (node: ExprNode): ExprNode => {
    const cached = memo.get(node);
    if (cached) return cached;
    let out: ExprNode;
    switch (node.kind) {
      case 'const':
      case 'param':
        out = node;
        break;
      case 'unknown':
        out = replace(node);
        break;
      case 'add':
        out = { kind: 'add', terms: node.terms.map(walk) };
        break;
      case 'mul':
        out = { kind: 'mul', factors: node.factors.map(walk) };
        break;
      case 'neg':
        out = { kind: 'neg', arg: walk(node.arg) };
        break;
      case 'pow':
        out = { kind: 'pow', base: walk(node.base), exponent: node.exponent };
        break;
    }
    memo.set(node, out);
    return out;
  };
  return equations.map(walk);
}
