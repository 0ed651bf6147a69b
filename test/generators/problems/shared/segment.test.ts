import { describe, expect, it } from 'vitest';
import { clipLine } from '../../../../generators/problems/shared/segment.ts';

describe('clipping lines to a window', () => {
  it('clips a line to a window and reports a miss', () => {
    const w = { xMin: 0, xMax: 1, yMin: 0, yMax: 1 };
    const seg = clipLine(0, 0, 1, 1, w)!;
    expect(seg[0][0]).toBeCloseTo(0, 12);
    expect(seg[1][1]).toBeCloseTo(1, 12);
    expect(clipLine(0, 5, 1, 0, w)).toBeNull();
  });
});
