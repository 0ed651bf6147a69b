import type { ExprNode, PolynomialSystem } from '../expr/node.ts';

/** True when every constant in the system's graphs has imaginary part exactly 0 (shared nodes visited once). */
export function hasOnlyRealConstants(system: PolynomialSystem): boolean {
  const seen = new Set<ExprNode>();
  const stack: ExprNode[] = [...system.equations];
  while (stack.length > 0) {
    const node = stack.pop()!;
    if (seen.has(node)) continue;
    seen.add(node);
    switch (node.kind) {
      case 'const': if (node.im !== 0) return false; break;
      case 'add': stack.push(...node.terms); break;
      case 'mul': stack.push(...node.factors); break;
      case 'neg': stack.push(node.arg); break;
      case 'pow': stack.push(node.base); break;
      default: break;
    }
  }
  return true;
}
