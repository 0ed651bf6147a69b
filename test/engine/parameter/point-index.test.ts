import { describe, expect, it } from 'vitest';
import { createPointIndex } from '../../../src/engine/parameter/point-index.ts';

describe('point index (relative tolerance 1e-8)', () => {
  const index = createPointIndex(2);
  const a = new Float64Array([1, 2, 3, 4]), b = new Float64Array([1, 2, 3, 4.001]);
  index.add(a); index.add(b);
  it.each([
    ['the same point', [1, 2, 3, 4], 0],
    ['a point within 1e-9 relative', [1 + 1e-9, 2, 3, 4], 0],
    ['a nearby but distinct point', [1, 2, 3, 4.001], 1],
    ['a point far away', [5, 5, 5, 5], -1],
  ])('finds %s', (_, x, expected) => {
    expect(index.find(Float64Array.from(x))).toBe(expected);
  });
});
