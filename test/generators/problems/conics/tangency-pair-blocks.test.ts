import { describe, expect, it } from 'vitest';
import { createArrowheadSolver, createRandom } from '../../../../src/engine/index.ts';
import { createTangencySolver } from '../../../../generators/problems/conics/tangency-pair-blocks.ts';
import { fiveConics, randomArrowhead, scrambledPairs } from '../../../engine/linalg/arrowhead-fixtures.ts';

describe.each([['five-conic pattern', fiveConics], ['scrambled 3×2 pattern', scrambledPairs]] as const)('3×2-block solver on the %s', (_, layout) => {
  // Each seed draws other pivot orders; zeroing a block's first row in its first column forces a swap.
  it.each([11, 12, 13, 14, 15, 16, 17, 18])('matches the general elimination to the last bit (seed %i)', (seed) => {
    const n = layout.n, a = randomArrowhead(layout, seed), random = createRandom(seed + 100);
    if (seed % 2 === 0) for (const blk of layout.blocks) a.fill(0, 2 * (blk.equations[0]! * n + blk.unknowns[0]!), 2 * (blk.equations[0]! * n + blk.unknowns[0]!) + 2);
    const fast = createTangencySolver(layout), general = createArrowheadSolver(layout);
    expect(fast.factor(a.slice())).toBeCloseTo(general.factor(a.slice()), 6);
    const b = new Float64Array(2 * n).map(() => random.normal());
    const x = new Float64Array(2 * n), y = new Float64Array(2 * n);
    fast.solve(b, x);
    general.solve(b, y);
    expect(Array.from(x)).toEqual(Array.from(y));
  });

  it('factors without the condition estimate to the same solution, and reports a singular block', () => {
    const n = layout.n, a = randomArrowhead(layout, 21), random = createRandom(22);
    const solver = createTangencySolver(layout);
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

