import { describe, expect, it } from 'vitest';
import { quickTwoSum, sumError, twoSum } from '../../../src/engine/dd/error-free-sum.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { fAdd, fCmp, finite } from '../interval/exact-rational.ts';
import { randomDouble } from '../interval/random-doubles.ts';
import { exactPair } from './exact-dd.ts';

// Reference: exact BigInt rational arithmetic. Theorems: Knuth, TAOCP vol. 2, §4.2.2 (two-sum for any a, b);
// Dekker, Numer. Math. 18 (1971) (fast two-sum when |a| ≥ |b|). Both: a + b = s + e exactly, s = RN(a + b).
const out = new Float64Array(2);
const isExactSum = (a: number, b: number, s: number, e: number): boolean => fCmp(fAdd(finite(a), finite(b)), exactPair(s, e)) === 0;

describe('twoSum', () => {
  it.each([
    ['whole range, subnormals, signed zeros, values near 1', 1],
    ['whole range, second stream', 2],
  ])('a + b = s + e exactly with s = a + b rounded (%s, 20000 pairs)', (_, seed) => {
    const random = createRandom(seed);
    for (let k = 0; k < 20000; k++) {
      const a = randomDouble(random), b = randomDouble(random);
      twoSum(a, b, out, 0);
      expect(out[0]).toBe(a + b);
      expect(isExactSum(a, b, out[0]!, out[1]!)).toBe(true);
      expect(sumError(a, b, a + b)).toBe(out[1]);
    }
  });

  it.each([
    [0, -0], [-0, -0], [1, 2 ** -53], [1, -(2 ** -54)], [2 ** 1000, -(2 ** 947)], [Number.MIN_VALUE, -Number.MIN_VALUE], [3, 2 ** 60],
  ])('edge case %s + %s is exact and the error is a number', (a, b) => {
    twoSum(a, b, out, 0);
    expect(Number.isNaN(out[1])).toBe(false);
    expect(isExactSum(a, b, out[0]!, out[1]!)).toBe(true);
  });
});

describe('quickTwoSum', () => {
  it('a + b = s + e exactly whenever |a| ≥ |b| (Dekker\'s condition), 20000 pairs over the whole range', () => {
    const random = createRandom(3);
    for (let k = 0; k < 20000; k++) {
      let a = randomDouble(random), b = randomDouble(random);
      if (Math.abs(a) < Math.abs(b)) [a, b] = [b, a];
      quickTwoSum(a, b, out, 0);
      expect(out[0]).toBe(a + b);
      expect(isExactSum(a, b, out[0]!, out[1]!)).toBe(true);
    }
  });

  it('can miss the error when the condition fails (1 + 2^60: the small operand first)', () => {
    quickTwoSum(1, 2 ** 60, out, 0);
    expect(isExactSum(1, 2 ** 60, out[0]!, out[1]!)).toBe(false);
  });
});
