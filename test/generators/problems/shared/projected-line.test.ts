import { describe, expect, it } from 'vitest';
import { projectedLineItems } from '../../../../generators/problems/shared/projected-line.ts';

const view = { xMin: -4, xMax: 4, yMin: -4, yMax: 4 };

// The projection (x₀ : x₁ : x₂ : …) ↦ (x₀ : x₁ : x₂) in the chart x₀ = 1 (common practice, no source): cases worked by hand.
describe('a line of projective space projected to the plane chart', () => {
  it.each([
    { name: 'the line x₂ = 0 through (1:0:0:…) and (1:1:0:…)', p: [1, 0, 0, 5], q: [1, 1, 0, -2], on: [[2, 0], [-3, 0]] },
    { name: 'the line through (1:1:1) and the point at infinity in direction (1, −1)', p: [2, 2, 2, 0, 1], q: [0, 1, -1, 1, 1], on: [[1, 1], [2, 0]] },
    { name: 'a line whose first point lies at infinity', p: [0, 1, 2, 0, 0], q: [1, 0, 1, 3, 3], on: [[0, 1], [1, 3]] },
  ])('$name: a segment through the expected points', ({ p, q, on }) => {
    const items = projectedLineItems(p, q, view);
    expect(items).toHaveLength(1);
    const item = items[0]!;
    if (item.shape !== 'polyline') throw new Error('expected a polyline');
    const [[x0, y0], [x1, y1]] = item.points as [[number, number], [number, number]];
    for (const [x, y] of on as [number, number][]) {
      const cross = (x1 - x0) * (y! - y0) - (y1 - y0) * (x! - x0);
      expect(Math.abs(cross)).toBeLessThan(1e-9);
    }
  });

  it('draws a point when the line projects to a point, and nothing when the image misses the view', () => {
    expect(projectedLineItems([1, 1, 1, 0], [0, 0, 0, 1], view)).toEqual([{ shape: 'point', x: 1, y: 1, layer: 'solution' }]);
    expect(projectedLineItems([1, 10, 10, 0], [0, 1, 0, 0], view)).toEqual([]);
  });
});
