import { describe, expect, it } from 'vitest';
import { depthOpacity, spaceSceneMarkup, spaceSvg } from '../../src/plots/space-svg.ts';
import { spacePayload } from '../../src/plots/space-payload.ts';
import type { SpaceFigure } from '../../src/atlas/space-figure.ts';

const figure: SpaceFigure = {
  kind: 'space',
  sight: { turn: 30, tilt: 25 },
  items: [
    { shape: 'stick', from: [-2, 0, 0], to: [2, 0, 0], layer: 'given', label: 'a rod' },
    ...[0, 1, 2].map((k) => ({ shape: 'stick' as const, from: [0, k - 1, -2] as [number, number, number], to: [0, k - 1, 2] as [number, number, number], layer: 'solution', solution: k })),
    { shape: 'dot', at: [1, 1, 1], layer: 'solution', solution: 3 },
  ],
};
const payload = spacePayload(figure);

describe('spaceSvg', () => {
  it('writes every item without scripts: runs as paths, dots as circles, solutions numbered, the sight recorded', () => {
    const svg = spaceSvg(payload, payload.sight, { labelledBy: 'cap' });
    expect(svg).toMatch(/^<svg [^>]*class="figure-svg space-svg" role="img" aria-labelledby="cap" data-sight="30 25">/);
    expect(new Set([...svg.matchAll(/data-solution="(\d+)"/g)].map((m) => m[1]))).toEqual(new Set(['0', '1', '2', '3']));
    expect(svg.match(/<circle [^>]*class="shape-dot/g)).toHaveLength(1);
    expect(svg).toContain('<title>a rod</title>');
    expect(svg).toContain('<title>Solutions: solution 4</title>');
    expect([...svg.matchAll(/<text [^>]*>([xyz])<\/text>/g)].map((m) => m[1])).toEqual(['x', 'y', 'z']);
  });

  it('draws a different scene for another sight and none of a hidden layer', () => {
    expect(spaceSceneMarkup(payload, { turn: 75, tilt: 10 })).not.toEqual(spaceSceneMarkup(payload, payload.sight));
    expect(spaceSceneMarkup(payload, payload.sight, new Set(['solution']))).not.toContain('data-layer="solution"');
  });

  it.each([[-1, 0.4], [0, 0.7], [1, 1], [2, 1], [-3, 0.4]])('fades a piece at depth %f of the radius to opacity %f', (depth, opacity) => {
    expect(depthOpacity(depth * 5, 5)).toBeCloseTo(opacity, 9);
  });
});
