import { numberLiteral } from '../compile/codegen.ts';
import { SPLIT_FACTOR, split } from './error-free-product.ts';

/**
 * Writes straight-line JavaScript for double-double arithmetic on real parts, the same algorithms as the kernels
 * of this folder (dd-add.ts, dd-mul.ts, dd-product-sum.ts) unrolled into `const` statements. A part is hi + lo
 * where lo = null means the part is exactly the double hi (a constant or a parameter): sums and products of such
 * parts drop the terms that would be zero, and constants are split at generation time, so products with a
 * constant of ≤ 26 significant bits (small integers) skip half of Dekker's partial products. Every variable is
 * split at most once. The emitted code allocates nothing and calls nothing.
 */

/** A number literal, or a local variable possibly negated. */
export type Scalar = { readonly literal: number } | { readonly name: string; readonly negated: boolean };

/** A real double-double operand hi + lo; lo = null when the part is exactly the double hi. */
export interface Part {
  readonly hi: Scalar;
  readonly lo: Scalar | null;
}

/** A product factor pair (a·b) inside a sum of products. */
export type Product = readonly [Part, Part];

/** JavaScript text of a scalar. */
export function scalarText(s: Scalar): string {
  if ('literal' in s) return numberLiteral(s.literal);
  return s.negated ? `-${s.name}` : s.name;
}

/** −s (no code: literals are negated in place, variables carry a sign). */
export function negateScalar(s: Scalar): Scalar {
  return 'literal' in s ? { literal: -s.literal } : { name: s.name, negated: !s.negated };
}

/** −part, exact and free. */
export function negatePart(p: Part): Part {
  return { hi: negateScalar(p.hi), lo: p.lo === null ? null : negateScalar(p.lo) };
}

/** True for the literal 0 (either sign) with no low part. */
export function isZeroPart(p: Part): boolean {
  return p.lo === null && 'literal' in p.hi && p.hi.literal === 0;
}

const literalPieces = new Float64Array(2);

/** Collects the statements of one generated function; temporaries are named t0, t1, … in emission order. */
export interface DdEmitter {
  readonly lines: string[];
  /** Emits `const tk = expression;` and returns tk. */
  bind(expression: string): Scalar;
  /** a + b in double-double: exact two-sum for two doubles, Alg. 4 for one (≤ 2u²), the accurate add for none (≤ 3u² + 13u³). */
  add(a: Part, b: Part): Part;
  /** Σ a·b over one or two products: Dekker's exact high product(s), cross terms in double, one renormalisation (≤ 7u²·|a·b| for one product, ≤ 14u²·Σ|a·b| for two). */
  productSum(products: readonly Product[]): Part;
  /** 2·part, exact (both halves doubled). */
  twice(p: Part): Part;
}

/** Creates an emitter with an empty statement list. */
export function createDdEmitter(): DdEmitter {
  const lines: string[] = [];
  let count = 0;
  const splits = new Map<string, readonly [Scalar, Scalar]>();
  const t = scalarText;
  const bind = (expression: string): Scalar => {
    const name = `t${count++}`;
    lines.push(`const ${name} = ${expression};`);
    return { name, negated: false };
  };
  const isZero = (s: Scalar): boolean => 'literal' in s && s.literal === 0;
  // Veltkamp's split: of a literal at generation time, of a variable once (split(−a) = −split(a) exactly)
  const splitOf = (s: Scalar): readonly [Scalar, Scalar] => {
    if ('literal' in s) {
      split(s.literal, literalPieces, 0);
      if (!Number.isFinite(literalPieces[0]!)) throw new RangeError(`constant ${s.literal} is too large to split (the split overflows above about 1.3e300)`);
      return [{ literal: literalPieces[0]! }, { literal: literalPieces[1]! }];
    }
    let pieces = splits.get(s.name);
    if (pieces === undefined) {
      const scaled = bind(`${SPLIT_FACTOR} * ${s.name}`);
      const high = bind(`${t(scaled)} - (${t(scaled)} - ${s.name})`);
      pieces = [high, bind(`${s.name} - ${t(high)}`)];
      splits.set(s.name, pieces);
    }
    return s.negated ? [negateScalar(pieces[0]), negateScalar(pieces[1])] : pieces;
  };
  const twoSum = (a: Scalar, b: Scalar): [Scalar, Scalar] => {
    const s = bind(`${t(a)} + ${t(b)}`);
    const v = bind(`${t(s)} - ${t(a)}`);
    return [s, bind(`(${t(a)} - (${t(s)} - ${t(v)})) + (${t(b)} - ${t(v)})`)];
  };
  const fastTwoSum = (a: Scalar, b: Scalar): Part => {
    const s = bind(`${t(a)} + ${t(b)}`);
    return { hi: s, lo: bind(`${t(b)} - (${t(s)} - ${t(a)})`) };
  };
  // p = RN(a·b) and its exact error, Dekker's partial products left to right, zero pieces dropped
  const twoProd = (a: Scalar, b: Scalar): [Scalar, Scalar] => {
    const p = bind(`${t(a)} * ${t(b)}`);
    const [a1, a2] = splitOf(a), [b1, b2] = splitOf(b);
    let error = `${t(a1)} * ${t(b1)} - ${t(p)}`;
    for (const [x, y] of [[a1, b2], [a2, b1], [a2, b2]] as const) if (!isZero(x) && !isZero(y)) error = `(${error}) + ${t(x)} * ${t(y)}`;
    return [p, bind(error)];
  };
  const crossTerms = ([a, b]: Product): string[] => {
    const out: string[] = [];
    if (b.lo !== null) out.push(`${t(a.hi)} * ${t(b.lo)}`);
    if (a.lo !== null) out.push(`${t(a.lo)} * ${t(b.hi)}`);
    return out;
  };
  const sumText = (terms: readonly string[]): string => (terms.length === 1 ? terms[0]! : `(${terms.join(' + ')})`);
  const add = (a: Part, b: Part): Part => {
    if (isZeroPart(a)) return b;
    if (isZeroPart(b)) return a;
    if (a.lo === null && b.lo === null) {
      const [s, e] = twoSum(a.hi, b.hi);
      return { hi: s, lo: e };
    }
    if (a.lo === null || b.lo === null) {
      const [x, y] = a.lo === null ? [b, a] : [a, b];
      const [s, e] = twoSum(x.hi, y.hi);
      return fastTwoSum(s, bind(`${t(x.lo!)} + ${t(e)}`));
    }
    const [sh, sl] = twoSum(a.hi, b.hi);
    const [th, tl] = twoSum(a.lo, b.lo);
    const v = fastTwoSum(sh, bind(`${t(sl)} + ${t(th)}`));
    return fastTwoSum(v.hi, bind(`${t(tl)} + ${t(v.lo!)}`));
  };
  const productSum = (products: readonly Product[]): Part => {
    const live = products.filter(([a, b]) => !isZeroPart(a) && !isZeroPart(b));
    if (live.length === 0) return { hi: { literal: 0 }, lo: null };
    if (live.length > 2) throw new RangeError('productSum takes at most two products');
    const exact = live.map(([a, b]) => twoProd(a.hi, b.hi));
    const cross = live.map(crossTerms).filter((c) => c.length > 0).map(sumText);
    if (exact.length === 1) {
      const [p, e] = exact[0]!;
      return cross.length === 0 ? { hi: p, lo: e } : fastTwoSum(p, bind(`${t(e)} + ${cross[0]}`));
    }
    const [[p1, e1], [p2, e2]] = exact as [[Scalar, Scalar], [Scalar, Scalar]];
    const [s, g] = twoSum(p1, p2);
    let small = bind(`${t(g)} + (${t(e1)} + ${t(e2)})`);
    if (cross.length > 0) small = bind(`${t(small)} + ${sumText(cross)}`);
    const [hi, lo] = twoSum(s, small);
    return { hi, lo };
  };
  const twice = (p: Part): Part => {
    const double = (s: Scalar): Scalar => ('literal' in s ? { literal: 2 * s.literal } : bind(`2 * ${t(s)}`));
    return { hi: double(p.hi), lo: p.lo === null ? null : double(p.lo) };
  };
  return { lines, bind, add, productSum, twice };
}
