import { linearChange, scaledUnknowns, unchanged, type CoordinateChange } from './coordinate-change.ts';
import { curveExcessFamily, denseFamily, hyperplaneExcessFamily, type StressFamily } from './stress-family.ts';

/** A named way to change coordinates, made per system (the linear change depends on n and the seed). */
export interface ChangeRecipe {
  readonly label: string;
  make(unknowns: number, seed: number): CoordinateChange;
}

/** The linear change of seed s is drawn from createRandom(LINEAR_CHANGE_SEED_OFFSET + s), apart from the coefficients' stream. */
export const LINEAR_CHANGE_SEED_OFFSET = 7_000_000;

/** The metamorphic variants: the base system, unknowns scaled by 40, 10³ and 10⁻³, and a random complex linear change. */
export const CHANGES: readonly ChangeRecipe[] = [
  { label: 'base', make: () => unchanged() },
  ...[40, 1e3, 1e-3].map((sigma) => ({ label: scaledUnknowns(sigma).label, make: () => scaledUnknowns(sigma) })),
  { label: 'linear change', make: (n, seed) => linearChange(n, LINEAR_CHANGE_SEED_OFFSET + seed) },
];

/** Dense random systems whose Bézout number is exact: (6,6,6), (4,4,4,4), (3,3,3,3,3) and ten quadrics in ten unknowns. */
export const DENSE_FAMILIES: readonly StressFamily[] = [
  denseFamily([6, 6, 6]),
  denseFamily([4, 4, 4, 4]),
  denseFamily([3, 3, 3, 3, 3]),
  denseFamily(Array.from({ length: 10 }, () => 2)),
];

/** Systems with a positive-dimensional excess component and a known number of isolated solutions. */
export const EXCESS_FAMILIES: readonly StressFamily[] = [
  hyperplaneExcessFamily([3, 3, 3]),
  hyperplaneExcessFamily([4, 4, 4]),
  hyperplaneExcessFamily([3, 3, 3, 3]),
  curveExcessFamily(1),
  curveExcessFamily(2),
  curveExcessFamily(3),
];

/** The bench's seeds: 1 … 10. */
export const BENCH_SEEDS: readonly number[] = Array.from({ length: 10 }, (_, k) => k + 1);
