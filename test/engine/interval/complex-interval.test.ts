import { describe, expect, it } from 'vitest';
import {
  complexAdd, complexInInterior, complexMul, complexNeg, complexScale, complexSqr, complexSub,
} from '../../../src/engine/interval/complex-interval.ts';
import { createRandom, type RandomSource } from '../../../src/engine/random.ts';
import { fAdd, fMul, fSub, finite, inside, type Fraction } from './exact-rational.ts';
import { pointIn, randomInterval } from './random-doubles.ts';

// Reference: exact rational complex arithmetic, (a + bi)(c + di) = (ac − bd) + (ad + bc)i; rectangle
// enclosures must hold every exact product of points taken from the input rectangles.
type C = [Fraction, Fraction];
const cAdd = (x: C, y: C): C => [fAdd(x[0], y[0]), fAdd(x[1], y[1])];
const cSub = (x: C, y: C): C => [fSub(x[0], y[0]), fSub(x[1], y[1])];
const cMul = (x: C, y: C): C => [fSub(fMul(x[0], y[0]), fMul(x[1], y[1])), fAdd(fMul(x[0], y[1]), fMul(x[1], y[0]))];

function randomRectangle(random: RandomSource, into: Float64Array): void {
  const [r0, r1] = randomInterval(random);
  const [i0, i1] = randomInterval(random);
  into[0] = r0; into[1] = r1; into[2] = i0; into[3] = i1;
}
function pointOf(random: RandomSource, box: Float64Array): [number, number] {
  return [pointIn(random, box[0]!, box[1]!), pointIn(random, box[2]!, box[3]!)];
}
const exactPoint = (p: [number, number]): C => [finite(p[0]), finite(p[1])];
const holds = (box: Float64Array, v: C): boolean => inside(v[0], box[0]!, box[1]!) && inside(v[1], box[2]!, box[3]!);

const a = new Float64Array(4), b = new Float64Array(4), out = new Float64Array(4);

describe.each([
  ['add', (o: Float64Array) => complexAdd(o, 0, a, 0, b, 0), cAdd],
  ['sub', (o: Float64Array) => complexSub(o, 0, a, 0, b, 0), cSub],
  ['mul', (o: Float64Array) => complexMul(o, 0, a, 0, b, 0), cMul],
] as [string, (o: Float64Array) => void, (x: C, y: C) => C][])('complex rectangle %s', (name, op, exact) => {
  it('encloses the exact rational result for 1500 random rectangle pairs', () => {
    const random = createRandom(name.charCodeAt(0) * 31);
    for (let k = 0; k < 1500; k++) {
      randomRectangle(random, a);
      randomRectangle(random, b);
      op(out);
      for (let s = 0; s < 3; s++) {
        const x = pointOf(random, a), y = pointOf(random, b);
        if (![...x, ...y].every(Number.isFinite)) continue;
        expect(holds(out, exact(exactPoint(x), exactPoint(y))), `${name} ${a} ${b} -> ${out}`).toBe(true);
      }
    }
  });
});

describe('complex rectangle unary operations', () => {
  it('square, negation and scaling by an exact complex double enclose the exact results', () => {
    const random = createRandom(99);
    for (let k = 0; k < 1500; k++) {
      randomRectangle(random, a);
      const x = pointOf(random, a);
      const c = pointOf(random, a);
      if (![...x, ...c].every(Number.isFinite)) continue;
      const ex = exactPoint(x);
      complexSqr(out, 0, a, 0);
      expect(holds(out, cMul(ex, ex))).toBe(true);
      complexNeg(out, 0, a, 0);
      expect(holds(out, cSub([{ n: 0n, d: 1n }, { n: 0n, d: 1n }], ex))).toBe(true);
      complexScale(out, 0, Float64Array.of(c[0], c[0], c[1], c[1]), 0, a, 0);
      expect(holds(out, cMul(exactPoint(c), ex))).toBe(true);
    }
  });

  it.each([
    ['strictly inside', [0, 1, 0, 1], [-1, 2, -1, 2], true],
    ['touching an edge', [0, 1, 0, 1], [0, 2, -1, 2], false],
    ['NaN is never inside', [NaN, 1, 0, 1], [-1, 2, -1, 2], false],
  ] as [string, number[], number[], boolean][])('interior test: %s', (_t, x, y, expected) => {
    expect(complexInInterior(Float64Array.from(x), 0, Float64Array.from(y), 0)).toBe(expected);
  });
});
