import { describe, expect, it } from 'vitest';
import { boxEdges, clipToBox } from '../../../../generators/problems/shared/space-box.ts';
import type { SpacePoint } from '../../../../src/atlas/space-figure.ts';

describe('boxEdges', () => {
  it('gives the twelve edges of the cube, each 2h long', () => {
    const edges = boxEdges(1.5, 'construction', 'cube');
    expect(edges).toHaveLength(12);
    for (const e of edges) expect(e.shape === 'stick' && Math.hypot(e.to[0] - e.from[0], e.to[1] - e.from[1], e.to[2] - e.from[2])).toBeCloseTo(3, 14);
  });
});

describe('clipToBox', () => {
  it.each([
    ['an axis through the centre', [0, 0, 0], [0, 0, 2], [[0, 0, -1], [0, 0, 1]]],
    ['a main diagonal', [0.5, 0.5, 0.5], [1, 1, 1], [[-1, -1, -1], [1, 1, 1]]],
    ['a line along a face', [0, 1, 0], [1, 0, 0], [[-1, 1, 0], [1, 1, 0]]],
  ] as const)('cuts %s at the faces of [−1, 1]³', (_, p, d, ends) => {
    const got = clipToBox(p as unknown as SpacePoint, d as unknown as SpacePoint, 1)!;
    got.forEach((q, i) => q.forEach((v, k) => expect(v).toBeCloseTo(ends[i]![k]!, 14)));
  });

  it.each([
    ['a line passing outside', [0, 0, 2], [1, 1, 0]],
    ['a zero direction', [0, 0, 0], [0, 0, 0]],
  ] as const)('returns null for %s', (_, p, d) => {
    expect(clipToBox(p as unknown as SpacePoint, d as unknown as SpacePoint, 1)).toBeNull();
  });
});
