import { describe, expect, it } from 'vitest';
import { nextDown, nextUp } from '../../../src/engine/interval/next-float.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { exactOf, fCmp, type Fraction } from './exact-rational.ts';
import { randomDouble } from './random-doubles.ts';

// Reference: IEEE 754-2008 §5.3.1 nextUp/nextDown; an independent BigInt bit-pattern version below.
const view = new DataView(new ArrayBuffer(8));
function referenceNextUp(x: number): number {
  if (Number.isNaN(x) || x === Infinity) return x;
  if (x === 0) return 2 ** -1074;
  view.setFloat64(0, x);
  const bits = view.getBigInt64(0);
  view.setBigInt64(0, x > 0 ? bits + 1n : bits - 1n);
  return view.getFloat64(0);
}

describe('nextUp and nextDown', () => {
  it.each([
    [0, 2 ** -1074],
    [-0, 2 ** -1074],
    [2 ** -1074, 2 ** -1073],
    [-(2 ** -1074), -0],
    [1, 1 + 2 ** -52],
    [-1, -(1 - 2 ** -53)],
    [2 ** -1022 - 2 ** -1074, 2 ** -1022], // largest subnormal to least normal
    [Number.MAX_VALUE, Infinity],
    [Infinity, Infinity],
    [-Infinity, -Number.MAX_VALUE],
    [1 + (2 ** 32 - 1) * 2 ** -52, 1 + 2 ** -20], // low 32-bit word all ones: the carry reaches the high word
  ])('nextUp(%s) is %s', (x, expected) => {
    expect(Object.is(nextUp(x), expected)).toBe(true);
  });

  it.each([
    [0, -(2 ** -1074)],
    [1, 1 - 2 ** -53],
    [-Number.MAX_VALUE, -Infinity],
    [-Infinity, -Infinity],
    [Infinity, Number.MAX_VALUE],
  ])('nextDown(%s) is %s', (x, expected) => {
    expect(Object.is(nextDown(x), expected)).toBe(true);
  });

  it('keeps NaN', () => {
    expect(nextUp(NaN)).toBeNaN();
    expect(nextDown(NaN)).toBeNaN();
  });

  it('agrees with a BigInt bit-pattern reference and moves strictly outward on 20000 random doubles', () => {
    const random = createRandom(501);
    for (let k = 0; k < 20000; k++) {
      const x = randomDouble(random);
      const up = nextUp(x), down = nextDown(x);
      expect(up).toBe(referenceNextUp(x));
      expect(down).toBe(-referenceNextUp(-x));
      if (Number.isFinite(up) && Number.isFinite(x)) expect(fCmp(exactOf(up) as Fraction, exactOf(x) as Fraction)).toBe(1);
      if (Number.isFinite(down) && Number.isFinite(x)) expect(fCmp(exactOf(down) as Fraction, exactOf(x) as Fraction)).toBe(-1);
    }
  });
});
