import type { RandomSource } from '../../../src/engine/random.ts';

/**
 * Test doubles spread over the whole range: signed mantissas times 2^k with k from −1080 (subnormals) to 1000,
 * exact zeros, small integers, and values near 1 (so that sums cancel). Deterministic for a given source.
 */
export function randomDouble(random: RandomSource): number {
  const kind = random.next();
  const sign = random.next() < 0.5 ? -1 : 1;
  if (kind < 0.05) return sign * 0;
  if (kind < 0.15) return sign * Math.floor(random.next() * 16);
  if (kind < 0.45) return sign * (1 + (random.next() - 0.5) * 2 ** -Math.floor(random.next() * 50));
  const exponent = Math.floor(random.next() * 2080) - 1080;
  return sign * (1 + random.next()) * 2 ** exponent;
}

/** A random interval [lo, hi] with lo ≤ hi, from two random doubles or a narrow one around a random double. */
export function randomInterval(random: RandomSource): [number, number] {
  const a = randomDouble(random);
  const b = random.next() < 0.5 ? randomDouble(random) : a + Math.abs(a) * random.next() * 1e-6;
  return a <= b ? [a, b] : [b, a];
}

/** A double inside [lo, hi] (an endpoint or a random interior point). */
export function pointIn(random: RandomSource, lo: number, hi: number): number {
  const u = random.next();
  if (u < 0.3) return lo;
  if (u < 0.6) return hi;
  const x = lo + (hi - lo) * random.next();
  return Math.min(hi, Math.max(lo, Number.isFinite(x) ? x : lo));
}
