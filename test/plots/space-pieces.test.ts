import { describe, expect, it } from 'vitest';
import { cutRuns, spacePieces } from '../../src/plots/space-pieces.ts';
import { placementOf } from '../../src/plots/space-view.ts';
import type { SpaceItem, SpacePoint } from '../../src/atlas/space-figure.ts';

const length = (run: readonly SpacePoint[]) => run.slice(1).reduce((s, p, k) => s + Math.hypot(p[0] - run[k]![0], p[1] - run[k]![1], p[2] - run[k]![2]), 0);

describe('cutRuns', () => {
  it.each([
    ['a stick 4 long into runs of 1', [[0, 0, 0], [4, 0, 0]], 1, 4],
    ['a stick shorter than a run', [[0, 0, 0], [0.3, 0.4, 0]], 1, 1],
    ['a bent chain 2 + 2 long into runs of at least 1.5 (chords first halved)', [[0, 0, 0], [0, 2, 0], [0, 2, 2]], 1.5, 2],
  ] as const)('cuts %s and keeps the whole length, ends joined', (_, points, size, runs) => {
    const cut = cutRuns(points as unknown as SpacePoint[], size);
    expect(cut).toHaveLength(runs);
    expect(cut.reduce((s, r) => s + length(r), 0)).toBeCloseTo(length(points as unknown as SpacePoint[]), 12);
    for (let k = 1; k < cut.length; k++) expect(cut[k]![0]).toEqual(cut[k - 1]![cut[k - 1]!.length - 1]);
    for (const r of cut.slice(0, -1)) expect(length(r)).toBeGreaterThanOrEqual(size - 1e-9);
  });
});

describe('spacePieces', () => {
  // Two sticks crossing the line of sight one behind the other: at level sight turned 0°, y points away from the viewer.
  const items: SpaceItem[] = [
    { shape: 'stick', from: [-1, -1, 0], to: [1, -1, 0], layer: 'solution', solution: 0 },
    { shape: 'stick', from: [-1, 1, 0], to: [1, 1, 0], layer: 'given' },
    { shape: 'dot', at: [0, 0, 0], layer: 'solution', solution: 1 },
  ];
  const placement = placementOf(items.flatMap((i) => (i.shape === 'stick' ? [i.from, i.to] : i.shape === 'dot' ? [i.at] : [])), 200, 200, 80);

  it.each([
    [{ turn: 0, tilt: 0 }, ['given', 'solution', 'solution']],
    [{ turn: 180, tilt: 0 }, ['solution', 'solution', 'given']],
  ] as const)('paints far to near at sight %o', (sight, order) => {
    const pieces = spacePieces(items, sight, placement, 10);
    expect(pieces.map((p) => p.layer)).toEqual(order);
    for (let k = 1; k < pieces.length; k++) expect(pieces[k]!.depth).toBeGreaterThanOrEqual(pieces[k - 1]!.depth);
  });

  it('leaves out hidden layers and keeps solution indices', () => {
    const pieces = spacePieces(items, { turn: 10, tilt: 20 }, placement, 0.5, new Set(['given']));
    expect(new Set(pieces.map((p) => p.layer))).toEqual(new Set(['solution']));
    expect(pieces.filter((p) => p.kind === 'stick')).toHaveLength(4);
    expect(pieces.find((p) => p.kind === 'dot')).toMatchObject({ solution: 1, points: [[100, 100]] });
  });
});
