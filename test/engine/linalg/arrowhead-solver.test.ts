import { describe, expect, it } from 'vitest';
import { createArrowheadSolver, createGeneralArrowheadSolver, checkArrowheadLayout, type ArrowheadLayout } from '../../../src/engine/linalg/arrowhead-solver.ts';
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
// Blocks of 3 equations in 2 unknowns with scrambled rows and columns and two border rows (the specialised solver).
const scrambledPairs: ArrowheadLayout = {
  n: 11, shared: [10, 0, 4, 7, 2], border: [9, 3],
  blocks: [{ unknowns: [5, 1], equations: [8, 0, 6] }, { unknowns: [9, 3], equations: [1, 10, 4] }, { unknowns: [6, 8], equations: [7, 2, 5] }],
};

function randomArrowhead(layout: ArrowheadLayout, seed: number): Float64Array {
  const random = createRandom(seed), n = layout.n, a = new Float64Array(2 * n * n);
  const fill = (rows: readonly number[], cols: readonly number[]): void => rows.forEach((r) => cols.forEach((c) => random.gaussianComplex(a, 2 * (r * n + c))));
  fill(layout.border, layout.shared);
  for (const b of layout.blocks) fill(b.equations, [...layout.shared, ...b.unknowns]);
  return a;
}

describe.each([['five-conic pattern', fiveConics], ['scrambled pattern', scrambled], ['scrambled 3×2 pattern', scrambledPairs]] as const)('arrowhead solver on the %s', (_, layout) => {
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

describe.each([['five-conic pattern', fiveConics], ['scrambled 3×2 pattern', scrambledPairs]] as const)('3×2-block solver on the %s', (_, layout) => {
  // Each seed draws other pivot orders; zeroing a block's first row in its first column forces a swap.
  it.each([11, 12, 13, 14, 15, 16, 17, 18])('matches the general elimination to the last bit (seed %i)', (seed) => {
    const n = layout.n, a = randomArrowhead(layout, seed), random = createRandom(seed + 100);
    if (seed % 2 === 0) for (const blk of layout.blocks) a.fill(0, 2 * (blk.equations[0]! * n + blk.unknowns[0]!), 2 * (blk.equations[0]! * n + blk.unknowns[0]!) + 2);
    const fast = createArrowheadSolver(layout), general = createGeneralArrowheadSolver(layout);
    expect(fast.factor(a.slice())).toBeCloseTo(general.factor(a.slice()), 6);
    const b = new Float64Array(2 * n).map(() => random.normal());
    const x = new Float64Array(2 * n), y = new Float64Array(2 * n);
    fast.solve(b, x);
    general.solve(b, y);
    expect(Array.from(x)).toEqual(Array.from(y));
  });

  it('factors without the condition estimate to the same solution, and reports a singular block', () => {
    const n = layout.n, a = randomArrowhead(layout, 21), random = createRandom(22);
    const solver = createArrowheadSolver(layout);
    const b = new Float64Array(2 * n).map(() => random.normal());
    const x = new Float64Array(2 * n), y = new Float64Array(2 * n);
    solver.factor(a);
    solver.solve(b, x);
    expect(solver.factorOnly!(a)).toBe(true);
    solver.solve(b, y);
    expect(Array.from(y)).toEqual(Array.from(x));
    const blk = layout.blocks[1]!;
    for (const r of blk.equations) a.fill(0, 2 * (r * n + blk.unknowns[1]!), 2 * (r * n + blk.unknowns[1]!) + 2);
    expect(solver.factorOnly!(a)).toBe(false);
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
