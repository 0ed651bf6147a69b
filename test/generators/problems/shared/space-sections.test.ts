import { describe, expect, it } from 'vitest';
import { spaceSections } from '../../../../generators/problems/shared/space-sections.ts';

describe('spaceSections', () => {
  // The sphere x² + y² + z² = 1 cut at height z is the circle of radius √(1 − z²) (common practice, no source).
  it.each([[0], [0.6], [-0.8]])('samples the section of the unit sphere at height %f on that circle, within a cell', (z) => {
    const items = spaceSections((x, y, w) => x * x + y * y + w * w - 1, [z], 1.2, 'given', 'sphere', 90);
    expect(items.length).toBeGreaterThan(0);
    const cell = 2.4 / 90;
    for (const item of items) {
      if (item.shape !== 'chain') throw new Error('expected chains');
      for (const [x, y, h] of item.points) {
        expect(h).toBe(z);
        expect(Math.abs(Math.hypot(x, y) - Math.sqrt(1 - z * z))).toBeLessThan(cell);
      }
    }
  });

  it('draws nothing at a height the surface does not reach', () => {
    expect(spaceSections((x, y, w) => x * x + y * y + w * w - 1, [1.1], 1.2, 'given', 'sphere')).toEqual([]);
  });
});
