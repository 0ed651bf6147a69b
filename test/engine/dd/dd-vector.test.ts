import { describe, expect, it } from 'vitest';
import { addScaledToDd, ddNormInf, roundDdToDouble, subtractFromDd } from '../../../src/engine/dd/dd-vector.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { fAdd, fCmp, fMul, fSub, finite, type Fraction } from '../interval/exact-rational.ts';
import { nextDown, nextUp } from '../../../src/engine/interval/next-float.ts';
import { U, abs, errorInUnits, exactPair, randomPair, randomScaled } from './exact-dd.ts';

// Bounds per real entry (u = 2⁻⁵³): subtracting a double 2u² relative (Algorithm 4), adding c·k 3u² + 13u³
// relative (exact product, then Algorithm 6), as stated by Joldes, Muller, Popescu, ACM TOMS 44(2), 2017 (read
// second-hand). Reference: exact BigInt rationals.
const n = 400;
const state = (seed: number): { hi: Float64Array; lo: Float64Array; other: Float64Array } => {
  const random = createRandom(seed);
  const hi = new Float64Array(2 * n), lo = new Float64Array(2 * n), other = new Float64Array(2 * n);
  for (let j = 0; j < 2 * n; j++) {
    [hi[j], lo[j]] = randomPair(random, -30, 30);
    // every fourth entry nearly cancels the state, the rest are small corrections
    other[j] = j % 4 === 0 ? hi[j]! * (1 + (random.next() - 0.5) * 2 ** -45) : randomScaled(random, -60, 0) * Math.abs(hi[j]!);
  }
  return { hi, lo, other };
};

describe('double-double vector kernels', () => {
  it('subtractFromDd: x ← x − dx within 2u² relative per entry, pairs stay normalised', () => {
    const { hi, lo, other } = state(61);
    const before = Array.from(hi, (h, j) => exactPair(h, lo[j]!));
    subtractFromDd(hi, lo, other);
    let worst = 0;
    for (let j = 0; j < 2 * n; j++) {
      worst = Math.max(worst, errorInUnits(exactPair(hi[j]!, lo[j]!), fSub(before[j]!, finite(other[j]!))));
      expect(hi[j]! + lo[j]!).toBe(hi[j]);
    }
    expect(worst).toBeLessThanOrEqual(2);
  });

  it.each([[0.5], [-1.75], [1 / 3]])('addScaledToDd: x ← x + c·k within 3u² + 13u³ relative per entry (c = %s)', (c) => {
    const { hi, lo, other } = state(62);
    const before = Array.from(hi, (h, j) => exactPair(h, lo[j]!));
    addScaledToDd(hi, lo, -c, other);
    let worst = 0;
    for (let j = 0; j < 2 * n; j++) {
      worst = Math.max(worst, errorInUnits(exactPair(hi[j]!, lo[j]!), fAdd(before[j]!, fMul(finite(-c), finite(other[j]!)))));
      expect(hi[j]! + lo[j]!).toBe(hi[j]);
    }
    expect(worst).toBeLessThanOrEqual(3 + 13 * U);
  });

  it('roundDdToDouble gives the double nearest each exact sum hi + lo, also for pairs that are not normalised', () => {
    const random = createRandom(63);
    const hi = Float64Array.from({ length: 2 * n }, () => randomScaled(random, -5, 5));
    const lo = Float64Array.from(hi, (h) => h * randomScaled(random, -70, 0));
    const out = new Float64Array(2 * n);
    roundDdToDouble(out, hi, lo);
    for (let j = 0; j < 2 * n; j++) {
      const exact = exactPair(hi[j]!, lo[j]!);
      const distance = (x: number): Fraction => abs(fSub(finite(x), exact));
      expect(fCmp(distance(out[j]!), distance(nextUp(out[j]!)))).toBeLessThanOrEqual(0);
      expect(fCmp(distance(out[j]!), distance(nextDown(out[j]!)))).toBeLessThanOrEqual(0);
    }
  });

  it('ddNormInf is the largest modulus of the rounded entries (within 3u relative of Math.hypot)', () => {
    const { hi, lo } = state(64);
    let expected = 0;
    for (let j = 0; j < 2 * n; j += 2) expected = Math.max(expected, Math.hypot(hi[j]! + lo[j]!, hi[j + 1]! + lo[j + 1]!));
    expect(Math.abs(ddNormInf(hi, lo) - expected)).toBeLessThanOrEqual(3 * U * expected);
    expect(ddNormInf(hi, lo, 0)).toBe(0);
  });
});
