import { describe, expect, it } from 'vitest';
import { dotEnclosure, midRadius } from '../../../src/engine/interval/dot-bound.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { exactOf, fAdd, fMul, finite, inside, type Fraction } from './exact-rational.ts';
import { pointIn, randomInterval } from './random-doubles.ts';

// Reference: exact rational dot products. The a-priori bound (Higham, Accuracy and Stability of Numerical
// Algorithms, 2nd ed. 2002, §3.1; midpoint–radius form after Rump, BIT 39, 1999) must enclose Σ aₖbₖ for every
// choice of exact bₖ inside the intervals.
describe('midpoint–radius dot product enclosure', () => {
  it.each([[2], [8], [32]])('encloses exact dot products of length %s, 400 random cases with cancellation and wide ranges', (length) => {
    const random = createRandom(length * 101);
    const out = new Float64Array(2), mr = new Float64Array(2);
    for (let trial = 0; trial < 400; trial++) {
      const spread = random.next() < 0.5 ? 1 : 300;
      const a: number[] = [], lo: number[] = [], hi: number[] = [];
      for (let k = 0; k < length; k++) {
        a.push(random.normal() * 2 ** Math.round((random.next() - 0.5) * spread));
        const [l, h] = random.next() < 0.5 ? randomInterval(random) : [random.normal(), random.normal()].sort((x, y) => x - y) as [number, number];
        const clamp = (v: number): number => Math.min(1e150, Math.max(-1e150, v));
        lo.push(clamp(l)); hi.push(clamp(h));
      }
      let sum = 0, absSum = 0, radiusSum = 0;
      for (let k = 0; k < length; k++) {
        midRadius(lo[k]!, hi[k]!, mr, 0);
        sum += a[k]! * mr[0]!;
        absSum += Math.abs(a[k]!) * Math.abs(mr[0]!);
        radiusSum += Math.abs(a[k]!) * mr[1]!;
      }
      dotEnclosure(length, Float64Array.of(sum, absSum, radiusSum), 0, out, 0);
      for (let s = 0; s < 3; s++) {
        let exact: Fraction = { n: 0n, d: 1n };
        for (let k = 0; k < length; k++) exact = fAdd(exact, fMul(exactOf(a[k]!) as Fraction, finite(pointIn(random, lo[k]!, hi[k]!))));
        expect(inside(exact, out[0]!, out[1]!)).toBe(true);
      }
    }
  });

  it('keeps a thin dot product thin: [1, 1]·3 + [2, 2]·5 stays within a few ulps of 13', () => {
    const out = new Float64Array(2);
    dotEnclosure(2, Float64Array.of(13, 13, 0), 0, out, 0);
    expect(out[0]).toBeLessThan(13);
    expect(out[1]).toBeGreaterThan(13);
    expect(out[1]! - out[0]!).toBeLessThan(1e-12);
  });

  it('gives no finite enclosure from an overflowed sum', () => {
    const out = new Float64Array(2);
    dotEnclosure(2, Float64Array.of(Infinity, Infinity, 0), 0, out, 0);
    expect(out[1]).toBe(Infinity);
  });
});
