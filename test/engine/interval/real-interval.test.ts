import { describe, expect, it } from 'vitest';
import {
  intervalAdd, intervalDiv, intervalMul, intervalNeg, intervalScale, intervalSqr, intervalSqrt, intervalSub,
} from '../../../src/engine/interval/real-interval.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { exactOf, fAdd, fCmp, fDiv, fMul, fSub, finite, inside, type Fraction } from './exact-rational.ts';
import { pointIn, randomInterval } from './random-doubles.ts';

// Reference: exact rational arithmetic (BigInt fractions) — the defining property of interval arithmetic
// (Moore, Interval Analysis, 1966): the exact result for any operands inside the inputs lies in the output.
type Binary = (out: Float64Array, o: number, a: Float64Array, ia: number, b: Float64Array, ib: number) => void;
const binaries: [string, Binary, (x: Fraction, y: Fraction) => Fraction | null][] = [
  ['add', intervalAdd, fAdd],
  ['sub', intervalSub, fSub],
  ['mul', intervalMul, fMul],
  ['div', intervalDiv, (x, y) => (y.n === 0n ? null : fDiv(x, y))],
];

const out = new Float64Array(2);
const a = new Float64Array(2);
const b = new Float64Array(2);

describe.each(binaries)('interval %s', (_name, op, exact) => {
  it('encloses the exact rational result for 3000 random operand pairs', () => {
    const random = createRandom(_name.length * 7919);
    let checked = 0;
    for (let k = 0; k < 3000; k++) {
      [a[0], a[1]] = randomInterval(random);
      [b[0], b[1]] = randomInterval(random);
      op(out, 0, a, 0, b, 0);
      for (let s = 0; s < 4; s++) {
        const x = finite(pointIn(random, a[0]!, a[1]!));
        const y = finite(pointIn(random, b[0]!, b[1]!));
        const v = exact(x, y);
        if (v === null) continue;
        expect(inside(v, out[0]!, out[1]!), `${_name} [${a[0]}, ${a[1]}], [${b[0]}, ${b[1]}] -> [${out[0]}, ${out[1]}]`).toBe(true);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(10000);
  });
});

describe('interval edge cases', () => {
  const run = (op: Binary, x: [number, number], y: [number, number]): [number, number] => {
    a.set(x); b.set(y);
    op(out, 0, a, 0, b, 0);
    return [out[0]!, out[1]!];
  };
  it.each([
    ['0 · ∞ counts as 0 at an endpoint', intervalMul, [0, 1], [1, Infinity], [-(2 ** -1074), Infinity]],
    ['division by an interval holding 0 gives the whole line', intervalDiv, [1, 2], [-1, 1], [-Infinity, Infinity]],
    ['∞/∞ at endpoints gives the whole line', intervalDiv, [1, Infinity], [1, Infinity], [-Infinity, Infinity]],
    ['overflow keeps +∞ as the upper end', intervalMul, [1e300, 1e300], [1e300, 1e300], [Number.MAX_VALUE, Infinity]],
    ['∞ − ∞ is no enclosure (NaN)', intervalAdd, [Infinity, Infinity], [-Infinity, -Infinity], [NaN, NaN]],
    ['subnormal products stay enclosed', intervalMul, [2 ** -1074, 2 ** -1074], [0.5, 0.5], [-(2 ** -1074), 2 ** -1074]], // 2⁻¹⁰⁷⁵ rounds to 0,
  ] as [string, Binary, [number, number], [number, number], [number, number]][])('%s', (_t, op, x, y, expected) => {
    const [lo, hi] = run(op, x, y);
    if (Number.isNaN(expected[0])) { expect(lo).toBeNaN(); return; }
    expect([lo, hi]).toEqual(expected);
  });

  it('exact results still widen outward, by a few floats at most', () => {
    const [lo, hi] = run(intervalAdd, [1, 1], [1, 1]);
    expect(lo).toBeLessThan(2);
    expect(hi).toBeGreaterThan(2);
    expect(hi - lo).toBeLessThanOrEqual(4 * 2 ** -51);
  });

  it('sqrt encloses the exact root (lo² ≤ x ≤ hi²) for 3000 random non-negative doubles', () => {
    const random = createRandom(42);
    for (let k = 0; k < 3000; k++) {
      const [x0, x1] = randomInterval(random);
      a[0] = Math.abs(x0); a[1] = Math.abs(x0) + Math.abs(x1);
      if (!Number.isFinite(a[1]!)) continue;
      intervalSqrt(out, 0, a, 0);
      const lo = finite(out[0]!), hi = finite(out[1]!);
      expect(fCmp(fMul(lo, lo), finite(a[0]!))).toBeLessThanOrEqual(0);
      expect(fCmp(fMul(hi, hi), finite(a[1]!))).toBeGreaterThanOrEqual(0);
    }
  });

  it.each([
    [[-4, -1], [NaN, NaN]],
    [[-1, 4], [0, 2 + 2 ** -51]],
    [[0, Infinity], [0, Infinity]],
  ] as [[number, number], [number, number]][])('sqrt of [%s] is %s', (x, expected) => {
    a.set(x);
    intervalSqrt(out, 0, a, 0);
    if (Number.isNaN(expected[0])) expect(out[0]).toBeNaN();
    else expect([out[0], out[1]]).toEqual(expected);
  });

  it('sqr, neg and scaling by an exact double enclose the exact results', () => {
    const random = createRandom(7);
    for (let k = 0; k < 2000; k++) {
      [a[0], a[1]] = randomInterval(random);
      const x = finite(pointIn(random, a[0]!, a[1]!));
      intervalSqr(out, 0, a, 0);
      expect(inside(fMul(x, x), out[0]!, out[1]!)).toBe(true);
      expect(out[0]).toBeGreaterThanOrEqual(0);
      intervalNeg(out, 0, a, 0);
      expect(inside(fSub({ n: 0n, d: 1n }, x), out[0]!, out[1]!)).toBe(true);
      const c = pointIn(random, a[0]!, a[1]!);
      intervalScale(out, 0, c, a, 0);
      expect(inside(fMul(exactOf(c) as Fraction, x), out[0]!, out[1]!)).toBe(true);
    }
  });
});
