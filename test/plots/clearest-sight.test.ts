import { describe, expect, it } from 'vitest';
import { clearestSight, SIGHT_CANDIDATES, sightClearness, telltaleDirections } from '../../src/plots/clearest-sight.ts';
import { sightBasis } from '../../src/plots/space-view.ts';
import type { SpaceItem } from '../../src/atlas/space-figure.ts';

describe('clearestSight', () => {
  it.each([
    ['a vertical stick', [{ shape: 'stick', from: [0, 0, -1], to: [0, 0, 1], layer: 'solution' }]],
    ['three axis sticks', [
      { shape: 'stick', from: [0, 0, 0], to: [1, 0, 0], layer: 'given' },
      { shape: 'stick', from: [0, 0, 0], to: [0, 1, 0], layer: 'given' },
      { shape: 'stick', from: [0, 0, 0], to: [0, 0, 1], layer: 'given' },
    ]],
    ['four dots', [[0, 0, 0], [1, 2, 0.5], [-1, 0.3, 2], [0.2, -1, -1]].map((at) => ({ shape: 'dot', at, layer: 'solution' }))],
  ] as [string, SpaceItem[]][])('picks, for %s, a candidate no other candidate beats', (_, items) => {
    const directions = telltaleDirections(items);
    const sight = clearestSight(items);
    const best = sightClearness(sight, directions);
    for (const other of SIGHT_CANDIDATES) expect(sightClearness(other, directions)).toBeLessThanOrEqual(best + 1e-12);
    expect(best).toBeGreaterThan(0.5);
  });

  it('measures a stick seen end on as fully foreshortened', () => {
    const t = sightBasis({ turn: 20, tilt: 35 }).toward;
    expect(sightClearness({ turn: 20, tilt: 35 }, [t])).toBeCloseTo(0, 7);
    expect(sightClearness({ turn: 20, tilt: 35 }, [])).toBe(1);
  });
});
