import { describe, expect, it } from 'vitest';
import { nodeBranches } from '../../../../generators/problems/shared/node-branches.ts';

// Exponents of x², xy, y², x³ (as [i, j]); the curves are our own examples, their tangent cones worked by hand.
const exponents = [[2, 0], [1, 1], [0, 2], [3, 0]];

describe('the branches drawn through a double point', () => {
  it.each([
    ['y² − x² − x³ (node, branches y = ±x)', [-1, 0, 1, -1], [[1, 1], [1, -1]]],
    ['xy + x³ (node, branches along the axes)', [0, 1, 0, 1], [[1, 0], [0, 1]]],
    ['x² − 4y² (branches y = ±x/2)', [1, 0, -4, 0], [[2, 1], [2, -1]]],
  ])('%s', (_, coefficients, expected) => {
    const items = nodeBranches(coefficients as number[], exponents, 0, 0, 1, 'branches');
    const slopes = items.map((item) => {
      const [[x0, y0], [x1, y1]] = (item as unknown as { points: [[number, number], [number, number]] }).points;
      expect(Math.hypot(x1 - x0, y1 - y0)).toBeCloseTo(2, 12);
      return Math.atan2(y1 - y0, x1 - x0);
    });
    const want = (expected as [number, number][]).map(([u, v]) => Math.atan2(v, u));
    const mod = (a: number) => ((a % Math.PI) + Math.PI) % Math.PI;
    expect(slopes.map(mod).sort()).toEqual(want.map(mod).sort().map((a) => expect.closeTo(a, 12)));
  });

  it('draws nothing at an isolated real point (x² + y², complex branches)', () => {
    expect(nodeBranches([1, 0, 1, 0], exponents, 0, 0, 1, 'branches')).toEqual([]);
  });
});
