import type { ExprNode } from './node.ts';

/** A value that can stand for an expression: a node, or a real number lifted to a constant. */
export type ExprLike = ExprNode | number;

/** Lifts a real number to a constant node; passes nodes through. Throws on NaN or ±Infinity. */
export function lift(value: ExprLike): ExprNode {
  if (typeof value !== 'number') return value;
  if (!Number.isFinite(value)) throw new RangeError(`expression constant must be finite, got ${value}`);
  return { kind: 'const', re: value, im: 0 };
}

/** A complex constant re + i·im. Throws on non-finite parts. */
export function constant(re: number, im = 0): ExprNode {
  if (!Number.isFinite(re) || !Number.isFinite(im)) throw new RangeError(`expression constant must be finite, got ${re} + ${im}i`);
  return { kind: 'const', re, im };
}

/** The unknown with the given index (its position in the packed solution vector) and display name. */
export function unknown(name: string, index: number): ExprNode {
  return { kind: 'unknown', index, name };
}

/** The parameter with the given index (its position in the packed parameter vector) and display name. */
export function param(name: string, index: number): ExprNode {
  return { kind: 'param', index, name };
}

/** The sum of the terms; an empty sum is 0. */
export function add(...terms: ExprLike[]): ExprNode {
  if (terms.length === 0) return constant(0);
  if (terms.length === 1) return lift(terms[0]!);
  return { kind: 'add', terms: terms.map(lift) };
}

/** a − b. */
export function sub(a: ExprLike, b: ExprLike): ExprNode {
  return add(a, neg(b));
}

/** −a. */
export function neg(a: ExprLike): ExprNode {
  return { kind: 'neg', arg: lift(a) };
}

/** The product of the factors; an empty product is 1. */
export function mul(...factors: ExprLike[]): ExprNode {
  if (factors.length === 0) return constant(1);
  if (factors.length === 1) return lift(factors[0]!);
  return { kind: 'mul', factors: factors.map(lift) };
}

/** base^exponent for a non-negative integer exponent; throws otherwise (the graph stays polynomial). */
export function pow(base: ExprLike, exponent: number): ExprNode {
  if (!Number.isInteger(exponent) || exponent < 0) {
    throw new RangeError(`exponent must be a non-negative integer, got ${exponent}`);
  }
  return { kind: 'pow', base: lift(base), exponent };
}

/** Σ coefficients[i] · terms[i], a linear combination. Lengths must agree. */
export function dot(coefficients: readonly ExprLike[], terms: readonly ExprLike[]): ExprNode {
  if (coefficients.length !== terms.length) throw new RangeError('dot: lengths differ');
  return add(...coefficients.map((c, i) => mul(c, terms[i]!)));
}

/** The determinant of a square matrix of expressions, by cofactor expansion (meant for n ≤ 4). */
export function det(m: readonly (readonly ExprLike[])[]): ExprNode {
  const n = m.length;
  if (m.some((row) => row.length !== n)) throw new RangeError('det: matrix is not square');
  if (n === 1) return lift(m[0]![0]!);
  if (n === 2) return sub(mul(m[0]![0]!, m[1]![1]!), mul(m[0]![1]!, m[1]![0]!));
  const terms: ExprNode[] = [];
  for (let j = 0; j < n; j++) {
    const minor = m.slice(1).map((row) => row.filter((_, k) => k !== j));
    const term = mul(m[0]![j]!, det(minor));
    terms.push(j % 2 === 0 ? term : neg(term));
  }
  return add(...terms);
}
