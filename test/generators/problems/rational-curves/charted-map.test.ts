import { describe, expect, it } from 'vitest';
import { chartedMapSystem, chartedMapUnknowns, chartedToShown, chartLength, convertMapChart, randomMapChart, shownToCharted } from '../../../../generators/problems/rational-curves/charted-map.ts';
import { parametrisedMapSeed } from '../../../../generators/problems/rational-curves/parametrised-map.ts';
import { compileSystem, createRandom } from '../../../../src/engine/index.ts';

function residual(degree: number, chart: Float64Array, x: Float64Array, p: Float64Array): number {
  const compiled = compileSystem(chartedMapSystem(degree, chart));
  const out = new Float64Array(2 * compiled.neq);
  compiled.evaluate(x, p, out, null, null);
  return Math.max(...Array.from(out, Math.abs));
}

const close = (a: Float64Array, b: Float64Array) => Math.max(...Array.from(a, (v, k) => Math.abs(v - b[k]!)));

// Scaling the map's coefficient vector changes neither its image nor the t_i (common practice, no source).
describe('the parametrised map in a random chart', () => {
  it.each([[3, 1], [4, 2], [4, 3]])('degree %i, seed %i: a shown solution in the chart solves the charted system and comes back unchanged', (degree, seed) => {
    const random = createRandom(seed);
    const chart = randomMapChart(degree, random);
    expect(chart).toHaveLength(2 * chartLength(degree));
    const { parameters, solution } = parametrisedMapSeed(degree, random);
    const charted = shownToCharted(degree, solution, chart);
    expect(residual(degree, chart, charted, parameters)).toBeLessThan(1e-10);
    expect(close(chartedToShown(degree, charted), solution)).toBeLessThan(1e-10);
  });

  it.each([[3, 16], [4, 25]])('degree %i: a square working system of %i unknowns (map, its chart, and a pair per traced point)', (degree, n) => {
    expect(chartedMapUnknowns(degree)).toHaveLength(n);
    expect(chartedMapSystem(degree, randomMapChart(degree, createRandom(1))).equations).toHaveLength(n);
  });

  it('moves a solution to another chart, where it solves that chart’s system', () => {
    const random = createRandom(9);
    const [a, b] = [randomMapChart(4, random), randomMapChart(4, random)];
    const { parameters, solution } = parametrisedMapSeed(4, random);
    const inB = convertMapChart(4, shownToCharted(4, solution, a), a, b);
    expect(residual(4, b, inB, parameters)).toBeLessThan(1e-10);
    expect(close(chartedToShown(4, inB), solution)).toBeLessThan(1e-10);
  });
});
