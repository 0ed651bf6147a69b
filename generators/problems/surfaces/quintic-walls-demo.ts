import type { ComplexInput } from '../../../src/atlas/definition.ts';
import { createRandom } from '../../../src/engine/index.ts';
import { coefficientsOf, linearForm, product, scale, sum, type NumericPolynomial } from '../shared/numeric-polynomial.ts';
import { QUINTIC_EXPONENTS, QUINTIC_NAMES } from './quintic-lines-formulation.ts';

/** Five real walls of our own (rows: coefficients of x₀ … x₄), a slanted pentatope in projective 4-space. */
export const WALLS: readonly (readonly number[])[] = [
  [1, 0, 0, 0, 0],
  [0.4, 1, 0, 0, 0],
  [-0.4, 0.3, 1, 0, 0],
  [0.2, 0, -0.5, 1, 0],
  [-0.3, 0.2, 0, 0.4, 1],
];

/** The seed of the bending quintic's coefficients. */
export const BENDING_SEED = 5;

/** The bending quintic: 126 real coefficients, independent standard normals rounded to two decimals, from BENDING_SEED. */
function bending(): NumericPolynomial {
  const random = createRandom(BENDING_SEED);
  return new Map(QUINTIC_EXPONENTS.map((e) => [e.join(','), Math.round(100 * random.normal()) / 100]));
}

/**
 * The demo quintic Π wallᵢ(x) + ε·B(x): the product of the five walls (which contains infinitely many lines, every
 * line in a wall) bent by ε times the bending quintic B, as the 126 coefficients by name (rounded to 9 decimals).
 */
export function bentWalls(epsilon: number): Record<string, ComplexInput> {
  const walls = product(...WALLS.map((row) => linearForm(row)));
  const coefficients = coefficientsOf(sum(walls, scale(bending(), epsilon)), QUINTIC_EXPONENTS);
  return Object.fromEntries(coefficients.map((c, m) => [QUINTIC_NAMES[m]!, c]));
}
