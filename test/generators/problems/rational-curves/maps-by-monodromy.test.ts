import { describe, expect, it } from 'vitest';
import { mapsByMonodromy } from '../../../../generators/problems/rational-curves/maps-by-monodromy.ts';
import { affineMapPoint } from '../../../../generators/problems/rational-curves/parametrised-map.ts';
import { CUBIC_EXPONENTS } from '../../../../generators/problems/rational-curves/nodal-cubic.ts';
import rationalCubics from '../../../../generators/problems/rational-curves/rational-cubics-through-8-points.ts';
import { mulPairs, pairAt, type ComplexPair as C } from '../../../../generators/problems/shared/complex-pair.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { solveSystem } from '../../../../src/engine/index.ts';

/** |f(x, y)| / Σ|c|·|monomial| for the page's cubic (x³ coefficient 1, then the unknown coefficients of a solution). */
function relativeValue(solution: Float64Array, [x, y]: C[]): number {
  const coefficients: C[] = [[1, 0], ...Array.from({ length: 9 }, (_, k) => pairAt(solution, k))];
  let value: C = [0, 0], scale = 0;
  CUBIC_EXPONENTS.forEach(([i, j], m) => {
    let term = coefficients[m]!;
    for (let r = 0; r < i!; r++) term = mulPairs(term, x!);
    for (let r = 0; r < j!; r++) term = mulPairs(term, y!);
    value = [value[0] + term[0], value[1] + term[1]];
    scale += Math.hypot(...term);
  });
  return Math.hypot(...value) / scale;
}

// Twelve rational cubics pass through eight general points: N_3 = 12 (Kontsevich–Manin, Comm. Math. Phys. 164, 1994).
describe('rational cubics as parametrised maps, by monodromy', () => {
  it.each([1, 2, 3])('seed %i: discovery, not told the count, saturates at 12 maps', async (seed) => {
    const result = await mapsByMonodromy(3, seed);
    expect(result.stop).toBe('saturated');
    expect(result.solutions).toHaveLength(12);
    expect(result.stats.failedPaths).toBe(0);
  });

  it('the 12 maps trace exactly the 12 nodal cubics the page’s implicit formulation finds through the same points', async () => {
    const result = await mapsByMonodromy(3, 1);
    // The map's parameters are the eight points' affine coordinates, in the cubic page's order px1, py1, …, px8, py8.
    const report = await solveSystem(systemOf(rationalCubics), result.parameters, { seed: 5, start: 'multihomogeneous' });
    expect(report.solutions).toHaveLength(12);
    const t: C = [0.3, 0.7];
    const matches = result.solutions.map((x) => {
      const point = affineMapPoint(3, x, result.parameters, t);
      const values = report.solutions.map((s) => relativeValue(s.point, point));
      const best = values.indexOf(Math.min(...values));
      expect(values[best]).toBeLessThan(1e-8);
      expect(values.filter((v) => v < 1e-4)).toHaveLength(1);
      return best;
    });
    expect(new Set(matches).size).toBe(12);
  });
});
