import { describe, expect, it } from 'vitest';
import { SPLIT_FACTOR, productError, split, twoProd } from '../../../src/engine/dd/error-free-product.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { fAdd, fCmp, fMul, finite } from '../interval/exact-rational.ts';
import { randomDouble } from '../interval/random-doubles.ts';
import { exactPair, significantBits } from './exact-dd.ts';

// Reference: exact BigInt rational arithmetic. Theorems: Veltkamp's splitting and Dekker's product (Dekker, Numer.
// Math. 18, 1971): a = h + l with h, l of ≤ 26 bits each for binary64; a·b = p + e exactly without over/underflow.
const out = new Float64Array(2);
const SPLIT_LIMIT = 2 ** 996;
const inProductRange = (a: number, b: number): boolean => {
  const p = Math.abs(a * b);
  return Math.abs(a) <= SPLIT_LIMIT && Math.abs(b) <= SPLIT_LIMIT && (a === 0 || b === 0 || (p >= 2 ** -969 && p < 2 ** 1023));
};

describe('split', () => {
  it('uses the factor 2^27 + 1', () => expect(SPLIT_FACTOR).toBe(2 ** 27 + 1));

  it.each([
    ['whole range up to 2^996, subnormals, signed zeros', 4],
    ['second stream', 5],
  ])('a = h + l exactly with h and l of at most 26 significant bits (%s, 20000 values)', (_, seed) => {
    const random = createRandom(seed);
    for (let k = 0; k < 20000; k++) {
      const a = randomDouble(random);
      if (Math.abs(a) > SPLIT_LIMIT) continue;
      split(a, out, 0);
      expect(fCmp(finite(a), exactPair(out[0]!, out[1]!))).toBe(0);
      expect(significantBits(out[0]!)).toBeLessThanOrEqual(26);
      expect(significantBits(out[1]!)).toBeLessThanOrEqual(26);
    }
  });

  it.each([[1 - 2 ** -53], [2 ** 996], [(2 ** 53 - 1) * 2 ** 943], [Number.MIN_VALUE], [2 ** -1022 * (1 - 2 ** -52)], [-(2 ** 53 - 1)]])('edge value %s splits exactly into ≤ 26-bit pieces', (a) => {
    split(a, out, 0);
    expect(fCmp(finite(a), exactPair(out[0]!, out[1]!))).toBe(0);
    expect(Math.max(significantBits(out[0]!), significantBits(out[1]!))).toBeLessThanOrEqual(26);
  });

  it('overflows past the documented limit (2^1000: the scaled value is infinite)', () => {
    split(2 ** 1000 * 1.5, out, 0);
    expect(Number.isFinite(out[0]!) && Number.isFinite(out[1]!)).toBe(false);
  });
});

describe('twoProd', () => {
  it.each([
    ['whole range, products inside [2^-969, 2^1023)', 6],
    ['second stream', 7],
  ])('a·b = p + e exactly with p = a·b rounded (%s, 20000 pairs)', (_, seed) => {
    const random = createRandom(seed);
    let checked = 0;
    for (let k = 0; k < 20000; k++) {
      const a = randomDouble(random), b = randomDouble(random);
      if (!inProductRange(a, b)) continue;
      checked++;
      twoProd(a, b, out, 0);
      expect(out[0]).toBe(a * b);
      expect(fCmp(fMul(finite(a), finite(b)), exactPair(out[0]!, out[1]!))).toBe(0);
      expect(productError(a, b, a * b)).toBe(out[1]);
    }
    expect(checked).toBeGreaterThan(5000);
  });

  it.each([
    [1 + 2 ** -52, 1 - 2 ** -53], [2 ** 26 + 1, 2 ** 27 - 1], [-0, 3], [0.1, 0.1], [2 ** 996, 2 ** 26], [(2 ** 53 - 1) * 2 ** -500, (2 ** 53 - 1) * 2 ** -469],
  ])('edge pair %s · %s is exact', (a, b) => {
    twoProd(a, b, out, 0);
    expect(fCmp(fMul(finite(a), finite(b)), fAdd(finite(out[0]!), finite(out[1]!)))).toBe(0);
  });
});
