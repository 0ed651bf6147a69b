/**
 * A seeded pseudo-random source (splitmix32 seeding xoshiro128**): the same seed gives the same stream on every
 * machine, so every run that records its seed is reproducible. Not for cryptography.
 */
export interface RandomSource {
  /** Uniform in [0, 1), 32 bits of randomness. */
  next(): number;
  /** Standard normal (Box–Muller; uses two draws). */
  normal(): number;
  /** A uniformly random point on the unit circle, written to out[i], out[i + 1]. */
  unitComplex(out: Float64Array, i: number): void;
  /** A complex number with independent standard normal parts, written to out[i], out[i + 1]. */
  gaussianComplex(out: Float64Array, i: number): void;
}

function splitmix32(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x9e3779b9) >>> 0;
    let z = s;
    z = Math.imul(z ^ (z >>> 16), 0x85ebca6b) >>> 0;
    z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35) >>> 0;
    return (z ^ (z >>> 16)) >>> 0;
  };
}

/** Creates a random source from a non-negative integer seed (values ≥ 2³² are reduced modulo 2³²). */
export function createRandom(seed: number): RandomSource {
  if (!Number.isInteger(seed) || seed < 0) throw new RangeError(`seed must be a non-negative integer, got ${seed}`);
  const init = splitmix32(seed % 4294967296);
  let a = init(), b = init(), c = init(), d = init();
  if ((a | b | c | d) === 0) a = 1;
  const u32 = (): number => {
    const r = Math.imul(rotl(Math.imul(b, 5), 7), 9) >>> 0;
    const t = b << 9;
    c ^= a; d ^= b; b ^= c; a ^= d; c ^= t; d = rotl(d, 11);
    return r;
  };
  const next = (): number => u32() / 4294967296;
  const normal = (): number => {
    const u = 1 - next();
    const v = next();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
  };
  return {
    next,
    normal,
    unitComplex(out, i) {
      const phi = 2 * Math.PI * next();
      out[i] = Math.cos(phi);
      out[i + 1] = Math.sin(phi);
    },
    gaussianComplex(out, i) {
      out[i] = normal();
      out[i + 1] = normal();
    },
  };
}

function rotl(x: number, k: number): number {
  return ((x << k) | (x >>> (32 - k))) >>> 0;
}
