// Arrowhead layouts and random matrices of their pattern, shared by the engine's solver tests and the conic family's 3×2-block solver tests.
import type { ArrowheadLayout } from '../../../src/engine/linalg/arrowhead-solver.ts';
import { createRandom } from '../../../src/engine/random.ts';

// Layout of the five-conic Jacobian: 6 shared unknowns, one chart row, five blocks of 2 unknowns and 3 equations.
export const fiveConics: ArrowheadLayout = {
  n: 16, shared: [0, 1, 2, 3, 4, 5], border: [0],
  blocks: [0, 1, 2, 3, 4].map((i) => ({ unknowns: [6 + 2 * i, 7 + 2 * i], equations: [1 + 3 * i, 2 + 3 * i, 3 + 3 * i] })),
};
// A scrambled layout: shared unknowns and block rows interleaved.
export const scrambled: ArrowheadLayout = {
  n: 7, shared: [6, 0, 3], border: [4],
  blocks: [{ unknowns: [1], equations: [0, 5] }, { unknowns: [2, 5], equations: [6, 2, 1] }, { unknowns: [4], equations: [3] }],
};
// Blocks of 3 equations in 2 unknowns with scrambled rows and columns and two border rows (the specialised solver).
export const scrambledPairs: ArrowheadLayout = {
  n: 11, shared: [10, 0, 4, 7, 2], border: [9, 3],
  blocks: [{ unknowns: [5, 1], equations: [8, 0, 6] }, { unknowns: [9, 3], equations: [1, 10, 4] }, { unknowns: [6, 8], equations: [7, 2, 5] }],
};

/** A random complex matrix with the layout's pattern (zero elsewhere), packed row-major. */
export function randomArrowhead(layout: ArrowheadLayout, seed: number): Float64Array {
  const random = createRandom(seed), n = layout.n, a = new Float64Array(2 * n * n);
  const fill = (rows: readonly number[], cols: readonly number[]): void => rows.forEach((r) => cols.forEach((c) => random.gaussianComplex(a, 2 * (r * n + c))));
  fill(layout.border, layout.shared);
  for (const b of layout.blocks) fill(b.equations, [...layout.shared, ...b.unknowns]);
  return a;
}

