import { describe, expect, it } from 'vitest';
import { fitWindow } from '../../../../generators/problems/shared/fit-window.ts';

describe('fitting a drawing window', () => {
  it('fits a window around circles, points, ellipses and line crossings', () => {
    const w = fitWindow([
      { shape: 'circle', cx: 0, cy: 0, r: 1, layer: 'given' },
      { shape: 'conic', coefficients: [1 / 9, 0, 1, -2 / 3, 0, 0], layer: 'solution' }, // (x − 3)²/9 + y² = 1: x ∈ [0, 6]
      { shape: 'line', a: 1, b: 0, c: 2, layer: 'given' },
      { shape: 'line', a: 0, b: 1, c: 3, layer: 'given' }, // crossing (−2, −3)
    ], 0);
    expect(w.xMin).toBeCloseTo(-2, 9);
    expect(w.xMax).toBeCloseTo(6, 9);
    expect(w.yMin).toBeCloseTo(-3, 9);
    expect(w.yMax).toBeCloseTo(1, 9);
  });
});
