import { describe, expect, it } from 'vitest';
import { leftNullVector } from '../../../../generators/problems/shared/left-null-vector.ts';

/** The largest |(cᵀM)_j| (common practice, no source: the defining property of a left null vector). */
function residual(c: readonly number[], rows: readonly (readonly number[])[]): number {
  return Math.max(...rows[0]!.map((_, j) => Math.abs(rows.reduce((s, row, i) => s + c[i]! * row[j]!, 0))));
}

describe('leftNullVector', () => {
  it.each([
    ['2 × 2, second row twice the first', [[1, 2], [2, 4]]],
    ['3 × 3, third row the sum of the others', [[1, 0, 2], [0, 3, -1], [1, 3, 1]]],
    ['5 × 5, fifth row = first + third + fourth, first pivot tiny', [[1e-9, 1, 0, 2, 1], [3, 0, 1, -1, 2], [0, 2, 2, 0, 1], [1, 1, -1, 4, 0], [1 + 1e-9, 4, 1, 6, 2]]],
  ])('%s: cᵀM = 0 within 1e-12, largest entry ±1', (_, rows) => {
    const c = leftNullVector(rows);
    expect(residual(c, rows)).toBeLessThan(1e-12);
    expect(Math.max(...c.map(Math.abs))).toBeCloseTo(1, 14);
  });
});
