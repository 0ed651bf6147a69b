import { describe, expect, it } from 'vitest';
import { createRandom } from '../../../../src/engine/index.ts';
import { createHomotopy } from '../../../../generators/problems/conics/tangency-homotopy.ts';
import { randomChart, tangencySeed } from '../../../../generators/problems/conics/tangency-seed.ts';
import { convertChart } from '../../../../generators/problems/conics/tangency-rechart.ts';
import { unknownCount } from '../../../../generators/problems/conics/tangency-layout.ts';

describe.each([{ points: 0, conics: 5 }, { points: 3, conics: 2 }])('changing the chart of $conics points of contact', (shape) => {
  const random = createRandom(21);
  const chart = randomChart(shape, random), other = randomChart(shape, random);
  const seed = tangencySeed(shape, chart, random);
  const n = unknownCount(shape);
  const residual = (c: Float64Array, x: Float64Array): number => {
    const h = new Float64Array(2 * n);
    createHomotopy({ ...shape, chart: c, from: seed.parameters, to: seed.parameters, gamma: [1, 0] }).evaluateValue!(x, 0, 0, h);
    return Math.max(...Array.from(h, Math.abs));
  };

  it('maps a solution to a solution of the same equations in the new chart (common practice, no source)', () => {
    expect(residual(other, convertChart(shape, seed.solution, chart, other))).toBeLessThan(1e-10);
  });
  it('maps back to the point it started from', () => {
    const back = convertChart(shape, convertChart(shape, seed.solution, chart, other), other, chart);
    back.forEach((v, i) => expect(v).toBeCloseTo(seed.solution[i]!, 10));
  });
});
