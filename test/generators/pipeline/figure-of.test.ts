import { describe, expect, it } from 'vitest';
import { figureOf } from '../../../generators/pipeline/figure-of.ts';
import type { ProblemDefinition, SpaceDrawingDefinition } from '../../../src/atlas/definition.ts';
import twoConics from './fixtures/two-conics.ts';

const space: SpaceDrawingDefinition = {
  kind: 'space',
  sight: () => ({ turn: 40, tilt: 25 }),
  configuration: (p) => [{ shape: 'dot', at: [p.a ?? 0, 0, 0], layer: 'given', label: 'the origin' }],
  solution: ([x, y]) => [{ shape: 'stick', from: [0, 0, 0], to: [x!, y!, 1], layer: 'solution' }],
};
const plane = twoConics as unknown as ProblemDefinition;
const inSpace = (drawing: SpaceDrawingDefinition): ProblemDefinition => ({ ...plane, drawing });
const real = { a: [0.5, 0] as const };
const solutions = [{ index: 0, values: [1, 2] }, { index: 3, values: [-1, 0.5] }];

describe('figureOf', () => {
  it('makes a figure in 3-space from a space drawing: its sight, the configuration, each solution tagged with its index', () => {
    expect(figureOf(inSpace(space), real, solutions, 'toy')).toEqual({
      kind: 'space',
      sight: { turn: 40, tilt: 25 },
      items: [
        { shape: 'dot', at: [0.5, 0, 0], layer: 'given', label: 'the origin' },
        { shape: 'stick', from: [0, 0, 0], to: [1, 2, 1], layer: 'solution', solution: 0 },
        { shape: 'stick', from: [0, 0, 0], to: [-1, 0.5, 1], layer: 'solution', solution: 3 },
      ],
    });
  });

  it('still makes a plane figure from a plane drawing', () => {
    const demo = twoConics.instances.find((i) => i.kind === 'demo')!;
    const parameters = Object.fromEntries(Object.entries(demo.parameters!).map(([k, v]) => [k, [typeof v === 'number' ? v : v[0], 0] as const]));
    const figure = figureOf(plane, parameters, [{ index: 0, values: [1, 2] }], 'toy');
    expect(figure).toMatchObject({ window: { xMin: -4 } });
    expect(figure!.items.at(-1)).toEqual({ shape: 'point', x: 1, y: 2, layer: 'solution', solution: 0 });
  });

  it.each([
    ['complex parameters', { a: [0.5, 1] as const }, space, null],
  ])('draws nothing for %s', (_, parameters, drawing, want) => {
    expect(figureOf(inSpace(drawing), parameters, solutions, 'toy')).toBe(want);
  });

  it.each([
    ['a sight tilted past the vertical', { ...space, sight: () => ({ turn: 0, tilt: 120 }) }, /drawing: produced an invalid figure at sight.tilt/],
    ['a chain of one point', { ...space, solution: () => [{ shape: 'chain', points: [[0, 0, 0]], closed: false, layer: 'solution' }] } as SpaceDrawingDefinition, /invalid figure at items/],
    ['a sight function that throws', { ...space, sight: () => { throw new Error('no view'); } }, /drawing.sight: threw no view/],
  ])('refuses %s, naming the drawing', (_, drawing, message) => {
    expect(() => figureOf(inSpace(drawing), real, solutions, 'toy')).toThrow(message);
  });
});
