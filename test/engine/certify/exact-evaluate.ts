import type { ExprNode } from '../../../src/engine/expr/node.ts';
import { fAdd, fMul, fSub, finite, type Fraction } from '../interval/exact-rational.ts';

/** An exact complex rational with its exact gradient in the unknowns (forward mode), the tests' reference. */
export interface ExactDual { re: Fraction; im: Fraction; dre: Fraction[]; dim: Fraction[] }

const ZERO: Fraction = { n: 0n, d: 1n };
const ONE: Fraction = { n: 1n, d: 1n };

function constantDual(re: number, im: number, n: number): ExactDual {
  return { re: finite(re), im: finite(im), dre: new Array(n).fill(ZERO), dim: new Array(n).fill(ZERO) };
}
function plus(a: ExactDual, b: ExactDual): ExactDual {
  return { re: fAdd(a.re, b.re), im: fAdd(a.im, b.im), dre: a.dre.map((x, k) => fAdd(x, b.dre[k]!)), dim: a.dim.map((x, k) => fAdd(x, b.dim[k]!)) };
}
function negate(a: ExactDual): ExactDual {
  const z = (x: Fraction): Fraction => fSub(ZERO, x);
  return { re: z(a.re), im: z(a.im), dre: a.dre.map(z), dim: a.dim.map(z) };
}
function times(a: ExactDual, b: ExactDual): ExactDual {
  const mr = (xr: Fraction, xi: Fraction, yr: Fraction, yi: Fraction): Fraction => fSub(fMul(xr, yr), fMul(xi, yi));
  const mi = (xr: Fraction, xi: Fraction, yr: Fraction, yi: Fraction): Fraction => fAdd(fMul(xr, yi), fMul(xi, yr));
  return {
    re: mr(a.re, a.im, b.re, b.im),
    im: mi(a.re, a.im, b.re, b.im),
    dre: a.dre.map((_, k) => fAdd(mr(a.dre[k]!, a.dim[k]!, b.re, b.im), mr(a.re, a.im, b.dre[k]!, b.dim[k]!))),
    dim: a.dre.map((_, k) => fAdd(mi(a.dre[k]!, a.dim[k]!, b.re, b.im), mi(a.re, a.im, b.dre[k]!, b.dim[k]!))),
  };
}

/** Evaluates a graph exactly at packed complex doubles x (unknowns) and p (parameters), with the exact gradient. */
export function exactEvaluate(node: ExprNode, x: Float64Array, p: Float64Array): ExactDual {
  const n = x.length / 2;
  const visit = (e: ExprNode): ExactDual => {
    switch (e.kind) {
      case 'const': return constantDual(e.re, e.im, n);
      case 'param': return constantDual(p[2 * e.index]!, p[2 * e.index + 1]!, n);
      case 'unknown': {
        const v = constantDual(x[2 * e.index]!, x[2 * e.index + 1]!, n);
        v.dre[e.index] = ONE;
        return v;
      }
      case 'add': return e.terms.map(visit).reduce(plus);
      case 'neg': return negate(visit(e.arg));
      case 'mul': return e.factors.map(visit).reduce(times);
      case 'pow': {
        let r = constantDual(1, 0, n);
        const b = visit(e.base);
        for (let k = 0; k < e.exponent; k++) r = times(r, b);
        return r;
      }
    }
  };
  return visit(node);
}
