import { describe, expect, it } from 'vitest';
import { ddAdd, ddAddDouble } from '../../../src/engine/dd/dd-add.ts';
import { createRandom, type RandomSource } from '../../../src/engine/random.ts';
import { fAdd } from '../interval/exact-rational.ts';
import { U, randomPair, randomScaled, worstRelativeError, type Pair } from './exact-dd.ts';

// Bounds (relative, in u² = 2⁻¹⁰⁶): 3 + 13u for the accurate add (Algorithm 6) and 2 for adding a double
// (Algorithm 4), as stated by Joldes, Muller, Popescu, ACM TOMS 44(2), 2017; we read them second-hand (quoted
// by documentation of other implementations), not in the paper itself. Reference: exact BigInt rationals.

/** Operand pairs: independent, nearly cancelling (hi parts within a few ulps of −a), exactly cancelling hi parts, far apart. */
const scenarios: [string, (r: RandomSource) => [Pair, Pair]][] = [
  ['independent, exponents −60…60', (r) => [randomPair(r, -60, 60), randomPair(r, -60, 60)]],
  ['near cancellation', (r) => {
    const a = randomPair(r, -20, 20);
    const bh = -a[0] * (1 + Math.floor(r.next() * 8 - 4) * 2 ** -52);
    return [a, [bh, (r.next() - 0.5) * Math.abs(bh) * U]];
  }],
  ['hi parts cancel exactly', (r) => {
    const a = randomPair(r, -20, 20);
    return [a, [-a[0], (r.next() - 0.5) * Math.abs(a[0]) * U]];
  }],
  ['magnitudes 2^70 apart', (r) => [randomPair(r, 30, 40), randomPair(r, -40, -30)]],
  ['wide exponents −900…900', (r) => [randomPair(r, -900, 900), randomPair(r, -900, 900)]],
];

describe('ddAdd (accurate add)', () => {
  it.each(scenarios)('relative error ≤ 3u² + 13u³ and a normalised result (%s, 5000 pairs)', (_, make) => {
    const random = createRandom(11);
    const { worst, normalised } = worstRelativeError(5000, () => make(random), ([ah, al], [bh, bl], out) => ddAdd(ah, al, bh, bl, out, 0), fAdd);
    expect(normalised).toBe(true);
    expect(worst).toBeLessThanOrEqual(3 + 13 * U);
  });
});

describe('ddAddDouble', () => {
  it.each(scenarios)('relative error ≤ 2u² and a normalised result (%s, second operand rounded to a double, 5000 pairs)', (_, make) => {
    const random = createRandom(12);
    const draw = (): [Pair, Pair] => {
      const [a, [b]] = make(random);
      return [a, [b, 0]];
    };
    const { worst, normalised } = worstRelativeError(5000, draw, ([ah, al], [b], out) => ddAddDouble(ah, al, b, out, 0), fAdd);
    expect(normalised).toBe(true);
    expect(worst).toBeLessThanOrEqual(2);
  });

  it('adds a double to a double exactly (lo = 0: the pair is the two-sum)', () => {
    const random = createRandom(13);
    const draw = (): [Pair, Pair] => [[randomScaled(random, -50, 50), 0], [randomScaled(random, -50, 50), 0]];
    expect(worstRelativeError(1000, draw, ([a], [b], out) => ddAddDouble(a, 0, b, out, 0), fAdd).worst).toBe(0);
  });
});
