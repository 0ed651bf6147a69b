import { describe, expect, it } from 'vitest';
import { ddProductSum } from '../../../src/engine/dd/dd-product-sum.ts';
import { createRandom, type RandomSource } from '../../../src/engine/random.ts';
import { fAdd, fMul, type Fraction } from '../interval/exact-rational.ts';
import { abs, errorInUnits, exactPair, randomPair } from './exact-dd.ts';

// Bound: |error| ≤ 14u²(|x·y| + |z·w|), u = 2⁻⁵³, our own first-order derivation (header of dd-product-sum.ts);
// the factor 1 + 2⁻⁴⁰ covers the second-order terms. Reference: exact BigInt rationals.
const out = new Float64Array(2);
type Pair = [number, number];

const scenarios: [string, (r: RandomSource) => Pair[]][] = [
  ['independent, exponents −60…60', (r) => [0, 1, 2, 3].map(() => randomPair(r, -60, 60))],
  ['z·w cancels x·y to a few ulps', (r) => {
    const [x, y, w] = [randomPair(r, -10, 10), randomPair(r, -10, 10), randomPair(r, -10, 10)];
    const zh = -(x[0] * y[0]) / w[0];
    return [x, y, [zh, (r.next() - 0.5) * Math.abs(zh) * 2 ** -53], w];
  }],
  ['products 2^80 apart', (r) => [randomPair(r, 40, 40), randomPair(r, 0, 0), randomPair(r, -40, -40), randomPair(r, 0, 0)]],
  ['exact doubles (lo = 0)', (r) => [0, 1, 2, 3].map((): Pair => [randomPair(r, -30, 30)[0], 0])],
];

describe('ddProductSum', () => {
  it.each(scenarios)('|error| ≤ 14u²(|x·y| + |z·w|) with a normalised result (%s, 5000 quadruples)', (_, make) => {
    const random = createRandom(41);
    let worst = 0;
    for (let k = 0; k < 5000; k++) {
      const [[xh, xl], [yh, yl], [zh, zl], [wh, wl]] = make(random) as [Pair, Pair, Pair, Pair];
      ddProductSum(xh, xl, yh, yl, zh, zl, wh, wl, out, 0);
      const xy = fMul(exactPair(xh, xl), exactPair(yh, yl)), zw = fMul(exactPair(zh, zl), exactPair(wh, wl));
      worst = Math.max(worst, errorInUnits(exactPair(out[0]!, out[1]!), fAdd(xy, zw), fAdd(abs(xy), abs(zw))));
      expect(out[0]! + out[1]!).toBe(out[0]);
    }
    expect(worst).toBeLessThanOrEqual(14 * (1 + 2 ** -40));
  });
});
