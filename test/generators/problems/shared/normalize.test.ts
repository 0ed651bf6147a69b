import { describe, expect, it } from 'vitest';
import { normalizeByLargest } from '../../../../generators/problems/shared/normalize.ts';

describe('scaling projective coordinates', () => {
  it('scales projective coordinates of a real point, given with a complex factor, back to real values', () => {
    const out = normalizeByLargest(new Float64Array([1, 1, -4, -4, 2, 2])); // (1, −4, 2)·(1 + i)
    expect([...out].map((v) => Number(v.toFixed(12)))).toEqual([-0.25, 0, 1, 0, -0.5, 0]);
  });
});
