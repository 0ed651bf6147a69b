import { describe, expect, it } from 'vitest';
import { createArrowheadSolver, checkArrowheadLayout, type ArrowheadLayout } from '../../../src/engine/linalg/arrowhead-solver.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { matVec } from '../../../src/engine/complex/packed.ts';

// Layout of the five-conic Jacobian: 6 shared unknowns, one chart row, five blocks of 2 unknowns and 3 equations.
const fiveConics: ArrowheadLayout = {
  n: 16, shared: [0, 1, 2, 3, 4, 5], border: [0],
  blocks: [0, 1, 2, 3, 4].map((i) => ({ unknowns: [6 + 2 * i, 7 + 2 * i], equations: [1 + 3 * i, 2 + 3 * i, 3 + 3 * i] })),
};
// A scrambled layout: shared unknowns and block rows interleaved.
const scrambled: ArrowheadLayout = {
  n: 7, shared: [6, 0, 3], border: [4],
  blocks: [{ unknowns: [1], equations: [0, 5] }, { unknowns: [2, 5], equations: [6, 2, 1] }, { unknowns: [4], equations: [3] }],
};

function randomArrowhead(layout: ArrowheadLayout, seed: number): Float64Array {
  const random = createRandom(seed), n = layout.n, a = new Float64Array(2 * n * n);
  const fill = (rows: readonly number[], cols: readonly number[]): void => rows.forEach((r) => cols.forEach((c) => random.gaussianComplex(a, 2 * (r * n + c))));
  fill(layout.border, layout.shared);
  for (const b of layout.blocks) fill(b.equations, [...layout.shared, ...b.unknowns]);
  return a;
}

describe.each([['five-conic pattern', fiveConics], ['scrambled pattern', scrambled]] as const)('arrowhead solver on the %s', (_, layout) => {
  it('solves A·x = b to a small residual (common practice, no source)', () => {
    const n = layout.n, a = randomArrowhead(layout, 3), random = createRandom(4);
    const solver = createArrowheadSolver(layout);
    expect(solver.factor(a)).toBeLessThan(1e8);
    const b = new Float64Array(2 * n).map(() => random.normal());
    const x = new Float64Array(2 * n);
    solver.solve(b, x);
    const ax = new Float64Array(2 * n);
    matVec(ax, a, x, n, n);
    ax.forEach((v, i) => expect(v).toBeCloseTo(b[i]!, 9));
  });

  it('solves in place when out aliases b', () => {
    const n = layout.n, a = randomArrowhead(layout, 6), random = createRandom(7);
    const solver = createArrowheadSolver(layout);
    solver.factor(a);
    const b = new Float64Array(2 * n).map(() => random.normal());
    const separate = new Float64Array(2 * n), inPlace = b.slice();
    solver.solve(b, separate);
    solver.solve(inPlace, inPlace);
    inPlace.forEach((v, i) => expect(v).toBe(separate[i]));
  });

  it('reports a singular matrix as infinitely ill-conditioned', () => {
    const a = randomArrowhead(layout, 5);
    const b = layout.blocks[0]!;
    for (const r of b.equations) for (const c of b.unknowns) { a[2 * (r * layout.n + c)] = 0; a[2 * (r * layout.n + c) + 1] = 0; }
    expect(createArrowheadSolver(layout).factor(a)).toBe(Infinity);
  });
});

describe('arrowhead layout checks', () => {
  it.each([
    ['unknowns that do not partition', { ...scrambled, shared: [6, 0, 0] }, /unknowns do not partition/],
    ['counts that do not add up', { ...fiveConics, border: [0], blocks: fiveConics.blocks.slice(1), n: 16 }, /partition/],
    ['a block with too few equations', { n: 2, shared: [], border: [], blocks: [{ unknowns: [0, 1], equations: [0] }] }, /partition|fewer equations/],
  ])('rejects %s', (_, layout, message) => {
    expect(() => checkArrowheadLayout(layout as ArrowheadLayout)).toThrow(message);
  });
});
