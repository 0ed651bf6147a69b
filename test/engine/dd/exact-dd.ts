import type { RandomSource } from '../../../src/engine/random.ts';
import { fAdd, fDiv, fSub, finite, type Fraction } from '../interval/exact-rational.ts';

/**
 * Exact references for the double-double tests: the exact value of a pair hi + lo, errors measured in units of
 * u² = 2⁻¹⁰⁶ (as plain doubles, accurate to ~1e-15, enough to compare with bounds like 3 + 13u), and random
 * normalised double-doubles.
 */
export const U = 2 ** -53;
export const U2 = 2 ** -106;

/** The exact value of hi + lo. */
export const exactPair = (hi: number, lo: number): Fraction => fAdd(finite(hi), finite(lo));

/** |f|. */
export const abs = (f: Fraction): Fraction => (f.n < 0n ? { n: -f.n, d: f.d } : f);
const bitLength = (n: bigint): number => (n === 0n ? 0 : n.toString(2).length);

/** A fraction as the nearest-ish double (relative error ~1e-16), for magnitudes and ratios far outside Number's BigInt range too. */
export function approximate(f: Fraction): number {
  if (f.n === 0n) return 0;
  const m = abs(f);
  const shift = 64 - (bitLength(m.n) - bitLength(m.d));
  const scaled = shift >= 0 ? (m.n << BigInt(shift)) / m.d : m.n / (m.d << BigInt(-shift));
  return (f.n > 0n ? 1 : -1) * (Number(scaled) * 2 ** -64) * 2 ** (64 - shift);
}

/** |computed − exact| / (u²·|scale|): the error in units of u² relative to the scale (the exact value for a relative error). */
export function errorInUnits(computed: Fraction, exact: Fraction, scale: Fraction = exact): number {
  const error = fSub(computed, exact);
  if (error.n === 0n) return 0;
  if (scale.n === 0n) return Infinity;
  return Math.abs(approximate(fDiv(error, scale))) / U2;
}

/** The number of significant bits of a double (0 for zero): the bit length of its odd integer mantissa. */
export function significantBits(x: number): number {
  let n = finite(x).n;
  if (n < 0n) n = -n;
  if (n === 0n) return 0;
  while ((n & 1n) === 0n) n >>= 1n;
  return bitLength(n);
}

/** A random double ±(1 + f)·2^k with k uniform in [kMin, kMax]. */
export function randomScaled(random: RandomSource, kMin: number, kMax: number): number {
  const k = kMin + Math.floor(random.next() * (kMax - kMin + 1));
  return (random.next() < 0.5 ? -1 : 1) * (1 + random.next()) * 2 ** k;
}

/** A normalised random double-double with |hi| ≈ 2^k, k in [kMin, kMax]: hi random, lo a random fraction of half an ulp. */
export function randomPair(random: RandomSource, kMin: number, kMax: number): [number, number] {
  const hi = randomScaled(random, kMin, kMax);
  const lo = (random.next() - 0.5) * Math.abs(hi) * U;
  const s = hi + lo;
  return [s, lo - (s - hi)];
}

/** A double-double operand (hi, lo). */
export type Pair = [number, number];

/**
 * Runs a kernel on `count` drawn operand pairs (result in out[0], out[1]) and returns the worst relative error
 * against the exact result, in units of u², and whether every result was normalised (hi = RN(hi + lo)).
 */
export function worstRelativeError(count: number, draw: () => [Pair, Pair], kernel: (a: Pair, b: Pair, out: Float64Array) => void, exact: (a: Fraction, b: Fraction) => Fraction): { worst: number; normalised: boolean } {
  const out = new Float64Array(2);
  let worst = 0, normalised = true;
  for (let k = 0; k < count; k++) {
    const [a, b] = draw();
    kernel(a, b, out);
    worst = Math.max(worst, errorInUnits(exactPair(out[0]!, out[1]!), exact(exactPair(...a), exactPair(...b))));
    normalised &&= out[0]! + out[1]! === out[0];
  }
  return { worst, normalised };
}
