import type { ExprNode } from '../../src/engine/index.ts';

/** A polynomial in n unknowns: exponent vector (joined by ",") → complex coefficient [re, im]. */
export type Polynomial = Map<string, [number, number]>;

const key = (e: readonly number[]) => e.join(',');
const exponents = (k: string) => k.split(',').map(Number);

function constant(n: number, re: number, im: number): Polynomial {
  return re === 0 && im === 0 ? new Map() : new Map([[key(new Array<number>(n).fill(0)), [re, im]]]);
}

function add(into: Polynomial, p: Polynomial, sign = 1): Polynomial {
  for (const [k, [re, im]] of p) {
    const c = into.get(k);
    into.set(k, c ? [c[0] + sign * re, c[1] + sign * im] : [sign * re, sign * im]);
  }
  return into;
}

function multiply(p: Polynomial, q: Polynomial): Polynomial {
  const out: Polynomial = new Map();
  for (const [kp, [a, b]] of p) {
    const ep = exponents(kp);
    for (const [kq, [c, d]] of q) {
      const k = key(exponents(kq).map((e, i) => e + ep[i]!));
      const prev = out.get(k) ?? [0, 0];
      out.set(k, [prev[0] + a * c - b * d, prev[1] + a * d + b * c]);
    }
  }
  return out;
}

/**
 * The expanded polynomial of an equation graph with the parameters substituted (packed complex, index order), in
 * binary64: each coefficient is a sum of products of the parameters and constants, so it carries a relative rounding
 * error of a few units in the last place times the number of terms that fell on it. Shared subgraphs are expanded once
 * (memo). Terms whose coefficient is exactly 0 are dropped.
 */
export function expandEquation(node: ExprNode, unknowns: number, parameters: Float64Array, memo: Map<ExprNode, Polynomial> = new Map()): Polynomial {
  const done = memo.get(node);
  if (done) return done;
  let out: Polynomial;
  switch (node.kind) {
    case 'const': out = constant(unknowns, node.re, node.im); break;
    case 'param': out = constant(unknowns, parameters[2 * node.index]!, parameters[2 * node.index + 1]!); break;
    case 'unknown': {
      const e = new Array<number>(unknowns).fill(0);
      e[node.index] = 1;
      out = new Map([[key(e), [1, 0]]]);
      break;
    }
    case 'add': out = node.terms.reduce((acc, t) => add(acc, expandEquation(t, unknowns, parameters, memo)), new Map() as Polynomial); break;
    case 'neg': out = add(new Map(), expandEquation(node.arg, unknowns, parameters, memo), -1); break;
    case 'mul': out = node.factors.reduce((acc, f) => multiply(acc, expandEquation(f, unknowns, parameters, memo)), constant(unknowns, 1, 0)); break;
    case 'pow': {
      const base = expandEquation(node.base, unknowns, parameters, memo);
      out = constant(unknowns, 1, 0);
      for (let k = 0; k < node.exponent; k++) out = multiply(out, base);
      break;
    }
    default: throw new Error(`expandEquation: unknown node kind ${JSON.stringify((node as { kind: unknown }).kind)}`);
  }
  for (const [k, [re, im]] of out) if (re === 0 && im === 0) out.delete(k);
  memo.set(node, out);
  return out;
}
