import { describe, expect, it } from 'vitest';
import { createArrowheadSolver, checkArrowheadLayout, type ArrowheadLayout } from '../../../src/engine/linalg/arrowhead-solver.ts';
import { fiveConics, randomArrowhead, scrambled, scrambledPairs } from './arrowhead-fixtures.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { matVec } from '../../../src/engine/complex/packed.ts';

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

describe('arrowhead layout checks', () => {
  it.each([
    ['unknowns that do not partition', { ...scrambled, shared: [6, 0, 0] }, /unknowns do not partition/],
    ['counts that do not add up', { ...fiveConics, border: [0], blocks: fiveConics.blocks.slice(1), n: 16 }, /partition/],
    ['a block with too few equations', { n: 2, shared: [], border: [], blocks: [{ unknowns: [0, 1], equations: [0] }] }, /partition|fewer equations/],
  ])('rejects %s', (_, layout, message) => {
    expect(() => checkArrowheadLayout(layout as ArrowheadLayout)).toThrow(message);
  });
});
