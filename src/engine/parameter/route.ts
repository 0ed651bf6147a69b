import type { PathEnd } from '../homotopy.ts';
import type { RandomSource } from '../random.ts';
import type { ParameterLeg } from './gamma-arc.ts';

/** A random unit complex number, the gamma of one leg. */
export function randomGamma(random: RandomSource): [number, number] {
  const g = new Float64Array(2);
  random.unitComplex(g, 0);
  return [g[0]!, g[1]!];
}

/** A point of parameter space with independent standard normal real and imaginary parts (length 2·np). */
export function randomParameterPoint(np: number, random: RandomSource): Float64Array {
  const p = new Float64Array(2 * np);
  for (let j = 0; j < np; j++) random.gaussianComplex(p, 2 * j);
  return p;
}

/**
 * The route of a parameter homotopy from p₀ to p₁: two gamma-trick legs through a random complex parameter point,
 * so that no leg runs along the real discriminant even when p₀ and p₁ are real. Throws on mismatched lengths.
 */
export function routeThrough(from: Float64Array, to: Float64Array, random: RandomSource): ParameterLeg[] {
  if (from.length !== to.length || from.length % 2 !== 0) throw new RangeError(`parameter route: lengths ${from.length} and ${to.length} differ or are odd`);
  const middle = randomParameterPoint(from.length / 2, random);
  return [
    { from, to: middle, gamma: randomGamma(random) },
    { from: middle, to, gamma: randomGamma(random) },
  ];
}

/** The same arc run backwards: from ↔ to and γ ↦ 1/γ (τ ↦ 1 − τ), as monodromy correspondences require. */
export function reverseLeg(leg: ParameterLeg): ParameterLeg {
  const [gr, gi] = leg.gamma;
  const d = gr * gr + gi * gi;
  return { from: leg.to, to: leg.from, gamma: [gr / d, -gi / d] };
}

/**
 * Tracks many starts along one leg and returns their ends in order. `safe` asks for stricter settings (used to
 * re-track two paths that landed on the same end). Implementations run the batch over a worker pool.
 */
export type LegTracker = (leg: ParameterLeg, starts: readonly Float64Array[], safe: boolean) => Promise<PathEnd[]>;
