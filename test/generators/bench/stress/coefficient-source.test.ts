import { describe, expect, it } from 'vitest';
import { coefficientSource } from '../../../../generators/bench/stress/coefficient-source.ts';
import { createRandom } from '../../../../src/engine/index.ts';

describe('coefficients as seeded Gaussian complex parameters', () => {
  it('hands out parameters c0, c1, … whose values are the seed stream of createRandom, in order', () => {
    const source = coefficientSource(5);
    const nodes = [source.coefficient(), source.coefficient(), source.coefficient()];
    expect(nodes).toEqual([0, 1, 2].map((k) => ({ kind: 'param', index: k, name: `c${k}` })));
    expect(source.names()).toEqual(['c0', 'c1', 'c2']);
    const stream = createRandom(5), expected = new Float64Array(6);
    for (let k = 0; k < 3; k++) stream.gaussianComplex(expected, 2 * k);
    expect(source.values()).toEqual(expected);
  });

  it('gives the same values for the same seed and different values for another', () => {
    const draw = (seed: number) => { const s = coefficientSource(seed); s.coefficient(); s.coefficient(); return s.values(); };
    expect(draw(9)).toEqual(draw(9));
    expect(draw(9)).not.toEqual(draw(10));
  });
});
