import { describe, expect, it } from 'vitest';
import { windowScales } from '../../src/plots/world-window.ts';

// Aspect-preserving window → screen map (common practice, no source): y points up on screen.
describe('windowScales', () => {
  it('keeps the aspect ratio and flips y', () => {
    const s = windowScales({ xMin: -2, xMax: 2, yMin: -1, yMax: 1 }, 400);
    expect(s.height).toBe(200);
    expect([s.x(-2), s.x(2), s.y(-1), s.y(1)]).toEqual([0, 400, 200, 0]);
  });
  it.each([
    ['empty in x', { xMin: 1, xMax: 1, yMin: 0, yMax: 1 }],
    ['reversed in y', { xMin: 0, xMax: 1, yMin: 1, yMax: 0 }],
    ['not finite', { xMin: 0, xMax: Number.POSITIVE_INFINITY, yMin: 0, yMax: 1 }],
  ])('rejects a window that is %s, naming it', (_, w) => {
    expect(() => windowScales(w, 100)).toThrow(/figure window/);
  });
});
