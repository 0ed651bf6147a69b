import { describe, expect, it } from 'vitest';
import { sampleCurve } from '../../../../generators/problems/shared/contour.ts';

describe('marching-squares sampling of plane curves', () => {
  it('samples the unit circle as one closed polyline within a cell of radius 1', () => {
    const w = { xMin: -2, xMax: 2, yMin: -2, yMax: 2 };
    const lines = sampleCurve((x, y) => x * x + y * y - 1, w, 80);
    expect(lines).toHaveLength(1);
    const [first, last] = [lines[0]![0]!, lines[0]!.at(-1)!];
    expect(first).toEqual(last);
    for (const [x, y] of lines[0]!) expect(Math.abs(Math.hypot(x, y) - 1)).toBeLessThan(4 / 80);
  });

  it('samples a hyperbola as two open branches', () => {
    const lines = sampleCurve((x, y) => x * y - 0.5, { xMin: -2, xMax: 2, yMin: -2, yMax: 2 }, 64);
    expect(lines).toHaveLength(2);
    for (const l of lines) expect(l[0]).not.toEqual(l.at(-1));
  });
});
