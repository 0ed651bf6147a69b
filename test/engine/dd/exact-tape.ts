import type { TapeInstruction } from '../../../src/engine/compile/tape.ts';
import { fAdd, fMul, fSub, finite, type Fraction } from '../interval/exact-rational.ts';
import { U2, approximate, exactPair } from './exact-dd.ts';

/** One tape value: exact parts and a first-order-safe bound on the double-double evaluator's error per part. */
export interface ExactTapeValue {
  readonly re: Fraction;
  readonly im: Fraction;
  readonly boundRe: number;
  readonly boundIm: number;
}

/** Per-operation constants in units of u² (see src/engine/dd/values-codegen.ts): a sum relative to its operands, a product to Σ|a·b|. */
const SUM = 3 + 13 * 2 ** -53;
const PRODUCT_SUM = 14;
const MARGIN = 1 + 1e-9;

/**
 * Evaluates a tape exactly (BigInt rationals) at x = xhi + xlo and p, and propagates a running error bound for the
 * double-double evaluator: an operation's bound is its operands' bounds carried through it (first order plus the
 * product of the two bounds) plus its own rounding, SUM·u²·(|a| + |b|) for ±, PRODUCT_SUM·u²·(|ar·br| + |ai·bi|)
 * for each part of a product (|·| of exact values enlarged by their bounds). Returns the value of every id.
 */
export function exactTapeValues(ins: readonly TapeInstruction[], xhi: Float64Array, xlo: Float64Array, p: Float64Array): ExactTapeValue[] {
  const values: ExactTapeValue[] = [];
  const size = (f: Fraction): number => Math.abs(approximate(f));
  for (const { op, a, b, re, im } of ins) {
    const x = values[a]!, y = values[b]!;
    switch (op) {
      case 'const': values.push({ re: finite(re), im: finite(im), boundRe: 0, boundIm: 0 }); break;
      case 'x': values.push({ re: exactPair(xhi[2 * a]!, xlo[2 * a]!), im: exactPair(xhi[2 * a + 1]!, xlo[2 * a + 1]!), boundRe: 0, boundIm: 0 }); break;
      case 'p': values.push({ re: finite(p[2 * a]!), im: finite(p[2 * a + 1]!), boundRe: 0, boundIm: 0 }); break;
      case 'neg': values.push({ re: fSub({ n: 0n, d: 1n }, x.re), im: fSub({ n: 0n, d: 1n }, x.im), boundRe: x.boundRe, boundIm: x.boundIm }); break;
      case 'add':
      case 'sub': {
        const f = op === 'add' ? fAdd : fSub;
        const part = (u: Fraction, bu: number, v: Fraction, bv: number): number => bu + bv + MARGIN * SUM * U2 * (size(u) + bu + size(v) + bv);
        values.push({ re: f(x.re, y.re), im: f(x.im, y.im), boundRe: part(x.re, x.boundRe, y.re, y.boundRe), boundIm: part(x.im, x.boundIm, y.im, y.boundIm) });
        break;
      }
      case 'mul': {
        // |u'·v' − u·v| ≤ bu|v| + |u|bv + bu·bv, plus the rounding of the two-product sum
        const carried = (u: Fraction, bu: number, v: Fraction, bv: number): number => bu * size(v) + size(u) * bv + bu * bv;
        const magnitude = (u: Fraction, bu: number, v: Fraction, bv: number): number => (size(u) + bu) * (size(v) + bv);
        const part = (u1: Fraction, b1: number, v1: Fraction, c1: number, u2: Fraction, b2: number, v2: Fraction, c2: number): number =>
          carried(u1, b1, v1, c1) + carried(u2, b2, v2, c2) + MARGIN * PRODUCT_SUM * U2 * (magnitude(u1, b1, v1, c1) + magnitude(u2, b2, v2, c2));
        values.push({
          re: fSub(fMul(x.re, y.re), fMul(x.im, y.im)),
          im: fAdd(fMul(x.re, y.im), fMul(x.im, y.re)),
          boundRe: part(x.re, x.boundRe, y.re, y.boundRe, x.im, x.boundIm, y.im, y.boundIm),
          boundIm: part(x.re, x.boundRe, y.im, y.boundIm, x.im, x.boundIm, y.re, y.boundRe),
        });
        break;
      }
    }
  }
  return values;
}

/** |computed − exact| for a part, as a double (the pair v + vlo is the evaluator's exact result). */
export const partError = (v: number, vlo: number, exact: Fraction): number => Math.abs(approximate(fSub(exactPair(v, vlo), exact)));
