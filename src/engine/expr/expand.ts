import type { ExprNode, PolynomialSystem } from './node.ts';

/** One term c·x^α of an expanded polynomial: exponents α (one per unknown) and the complex coefficient. */
export interface ExpandedTerm {
  readonly exponents: readonly number[];
  readonly re: number;
  readonly im: number;
}

/** Raised when an expansion would pass the term limit (the caller falls back to working without it). */
export class ExpansionTooLarge extends Error {}

type Poly = Map<string, { e: number[]; re: number; im: number }>;

/**
 * Expands every equation of the system, with the parameters fixed at `parameters` (packed complex), into its terms
 * c·x^α in the unknowns, in floating point (one rounding per operation; terms that cancel to exactly 0 are dropped).
 * Terms are sorted by exponent vector for determinism. Throws ExpansionTooLarge when an intermediate polynomial
 * would have more than `maxTerms` terms (default 20000), so a graph with huge expanded form costs no more than that.
 */
export function expandSystem(system: PolynomialSystem, parameters: Float64Array, maxTerms = 20000): ExpandedTerm[][] {
  const n = system.unknowns.length;
  const memo = new Map<ExprNode, Poly>();
  const constant = (re: number, im: number): Poly => {
    const p: Poly = new Map();
    if (re !== 0 || im !== 0) p.set(key(new Array<number>(n).fill(0)), { e: new Array<number>(n).fill(0), re, im });
    return p;
  };
  const check = (p: Poly): Poly => {
    if (p.size > maxTerms) throw new ExpansionTooLarge(`expanded form passes ${maxTerms} terms`);
    return p;
  };
  const add = (a: Poly, b: Poly, sign: number): Poly => {
    const out: Poly = new Map();
    for (const [k, t] of a) out.set(k, { e: t.e, re: t.re, im: t.im });
    for (const [k, t] of b) {
      const o = out.get(k);
      if (o) { o.re += sign * t.re; o.im += sign * t.im; if (o.re === 0 && o.im === 0) out.delete(k); }
      else out.set(k, { e: t.e, re: sign * t.re, im: sign * t.im });
    }
    return check(out);
  };
  const mul = (a: Poly, b: Poly): Poly => {
    const out: Poly = new Map();
    for (const s of a.values()) for (const t of b.values()) {
      const e = s.e.map((v, j) => v + t.e[j]!);
      const k = key(e);
      const re = s.re * t.re - s.im * t.im, im = s.re * t.im + s.im * t.re;
      const o = out.get(k);
      if (o) { o.re += re; o.im += im; } else out.set(k, { e, re, im });
    }
    for (const [k, t] of out) if (t.re === 0 && t.im === 0) out.delete(k);
    return check(out);
  };
  const walk = (node: ExprNode): Poly => {
    const cached = memo.get(node);
    if (cached) return cached;
    let out: Poly;
    switch (node.kind) {
      case 'const': out = constant(node.re, node.im); break;
      case 'param': out = constant(parameters[2 * node.index]!, parameters[2 * node.index + 1]!); break;
      case 'unknown': {
        const e = new Array<number>(n).fill(0);
        e[node.index] = 1;
        out = new Map([[key(e), { e, re: 1, im: 0 }]]);
        break;
      }
      case 'add': out = node.terms.reduce((acc, t) => add(acc, walk(t), 1), constant(0, 0)); break;
      case 'mul': out = node.factors.reduce((acc, f) => mul(acc, walk(f)), constant(1, 0)); break;
      case 'neg': out = add(constant(0, 0), walk(node.arg), -1); break;
      case 'pow': {
        out = constant(1, 0);
        let square = walk(node.base);
        for (let e = node.exponent; e > 0; e >>>= 1) {
          if (e & 1) out = mul(out, square);
          if (e > 1) square = mul(square, square);
        }
        break;
      }
    }
    memo.set(node, out);
    return out;
  };
  return system.equations.map((eq) =>
    [...walk(eq).values()]
      .map((t) => ({ exponents: t.e, re: t.re, im: t.im }))
      .sort((a, b) => compareExponents(a.exponents, b.exponents)),
  );
}

function key(e: readonly number[]): string {
  return e.join(',');
}

function compareExponents(a: readonly number[], b: readonly number[]): number {
  for (let j = 0; j < a.length; j++) if (a[j] !== b[j]) return a[j]! - b[j]!;
  return 0;
}
