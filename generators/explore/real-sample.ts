import type { RandomSource } from '../../src/engine/index.ts';

/** A real parameter point (packed complex, imaginary parts exactly 0) with independent standard normal entries. */
export function realSample(np: number, random: RandomSource): Float64Array {
  const p = new Float64Array(2 * np);
  for (let j = 0; j < np; j++) p[2 * j] = random.normal();
  return p;
}

/** A real move from `p`: every real part plus scale · N(0, 1) (imaginary parts stay 0). */
export function realMove(p: Float64Array, scale: number, random: RandomSource): Float64Array {
  const q = new Float64Array(p.length);
  for (let j = 0; j < p.length; j += 2) q[j] = p[j]! + scale * random.normal();
  return q;
}
