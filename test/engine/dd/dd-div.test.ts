import { describe, expect, it } from 'vitest';
import { ddDiv } from '../../../src/engine/dd/dd-div.ts';
import { createRandom, type RandomSource } from '../../../src/engine/random.ts';
import { fDiv } from '../interval/exact-rational.ts';
import { U, randomPair, worstRelativeError, type Pair } from './exact-dd.ts';

// Bound (relative, in u² = 2⁻¹⁰⁶): 15 + 56u for Algorithm 17 of Joldes, Muller, Popescu, ACM TOMS 44(2), 2017,
// read second-hand, not in the paper itself. Reference: exact BigInt rationals.

const scenarios: [string, (r: RandomSource) => [Pair, Pair]][] = [
  ['exponents −60…60', (r) => [randomPair(r, -60, 60), randomPair(r, -60, 60)]],
  ['exponents −400…400', (r) => [randomPair(r, -400, 400), randomPair(r, -400, 400)]],
  ['quotients near 1', (r) => {
    const b = randomPair(r, -5, 5);
    return [[b[0] * (1 + (r.next() - 0.5) * 2 ** -30), (r.next() - 0.5) * Math.abs(b[0]) * U], b];
  }],
];

describe('ddDiv', () => {
  it.each(scenarios)('relative error ≤ 15u² + 56u³ and a normalised result (%s, 5000 pairs)', (_, make) => {
    const random = createRandom(31);
    const { worst, normalised } = worstRelativeError(5000, () => make(random), ([ah, al], [bh, bl], out) => ddDiv(ah, al, bh, bl, out, 0), fDiv);
    expect(normalised).toBe(true);
    expect(worst).toBeLessThanOrEqual(15 + 56 * U);
  });

  it('gives no finite value for a zero divisor (±∞ or NaN, as documented)', () => {
    const out = new Float64Array(2);
    ddDiv(1, 0, 0, 0, out, 0);
    expect(Number.isFinite(out[0]!)).toBe(false);
  });
});
