import { describe, expect, it } from 'vitest';
import { isRealPoint } from '../../../src/engine/solve/real.ts';
import { shardRange } from '../../../src/engine/solve/solve-system.ts';

describe('isRealPoint (relative imaginary part; common practice, no source)', () => {
  it.each([
    [[1, 0, -2, 0], true],
    [[1, 1e-12, 3, -1e-12], true],
    [[1e6, 1e-3, 0, 0], true], // 1e-3 ≤ 1e-8 · 1e6
    [[1, 1e-6, 0, 0], false],
    [[0, 1e-9, 0, 0], true], // sizes below 1 count as 1
  ])('%j → %s', (point, real) => {
    expect(isRealPoint(new Float64Array(point))).toBe(real);
  });
  it('takes a tolerance', () => {
    expect(isRealPoint(new Float64Array([1, 1e-6]), 1e-5)).toBe(true);
  });
});

describe('shardRange', () => {
  it('splits paths into contiguous batches that cover every path once', () => {
    const parts = [0, 1, 2].map((index) => shardRange(10, { index, count: 3 }));
    expect(parts).toEqual([[0, 3], [3, 6], [6, 10]]);
  });
  it('names a bad shard', () => {
    expect(() => shardRange(10, { index: 3, count: 3 })).toThrow(/0 ≤ index < count/);
  });
});
