import type { ExprNode } from '../../../../src/engine/index.ts';

/** A complex number as [re, im]. */
export type C = [number, number];

/** Evaluates an expression graph at complex unknowns and parameters (test helper, straightforward recursion). */
export function evaluate(node: ExprNode, x: readonly C[], p: readonly C[]): C {
  switch (node.kind) {
    case 'const': return [node.re, node.im];
    case 'unknown': return x[node.index]!;
    case 'param': return p[node.index]!;
    case 'neg': { const [a, b] = evaluate(node.arg, x, p); return [-a, -b]; }
    case 'add': return node.terms.reduce<C>((s, t) => { const v = evaluate(t, x, p); return [s[0] + v[0], s[1] + v[1]]; }, [0, 0]);
    case 'mul': return node.factors.reduce<C>((s, t) => times(s, evaluate(t, x, p)), [1, 0]);
    case 'pow': { const b = evaluate(node.base, x, p); let s: C = [1, 0]; for (let k = 0; k < node.exponent; k++) s = times(s, b); return s; }
  }
}

function times(a: C, b: C): C {
  return [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
}

/** Lifts real numbers to complex pairs. */
export function real(values: readonly number[]): C[] {
  return values.map((v) => [v, 0]);
}

/** The largest modulus of the system's equations at complex unknowns and parameters. */
export function largestResidual(equations: readonly ExprNode[], x: readonly C[], p: readonly C[]): number {
  return Math.max(...equations.map((e) => Math.hypot(...evaluate(e, x, p))));
}

/** Parameter values in the formulation's order from a record of real numbers. */
export function paramsFrom(names: readonly string[], values: Readonly<Record<string, number>>): C[] {
  return names.map((n) => {
    const v = values[n];
    if (v === undefined) throw new Error(`test data lacks parameter ${n}`);
    return [v, 0];
  });
}
