import { createRandom } from '../../../src/engine/index.ts';

/**
 * A real (size×size) change of coordinates drawn from `seed`: the identity plus 0.5 times independent standard normal
 * entries, each rounded to two decimals so that it can be printed exactly. Deterministic; invertibility is the caller's to check.
 */
export function randomFrame(size: number, seed: number): number[][] {
  const random = createRandom(seed);
  return Array.from({ length: size }, (_, i) => Array.from({ length: size }, (_, j) => Math.round(100 * ((i === j ? 1 : 0) + 0.5 * random.normal())) / 100));
}
