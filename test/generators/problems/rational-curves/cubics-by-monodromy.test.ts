import { describe, expect, it } from 'vitest';
import { cubicsByMonodromy } from '../../../../generators/problems/rational-curves/cubics-by-monodromy.ts';
import { mapPoint, TRACED } from '../../../../generators/problems/rational-curves/parametrised-cubic.ts';
import { CUBIC_EXPONENTS } from '../../../../generators/problems/rational-curves/nodal-cubic.ts';
import rationalCubics from '../../../../generators/problems/rational-curves/rational-cubics-through-8-points.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { solveSystem } from '../../../../src/engine/index.ts';

type C = [number, number];
const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const div = (a: C, b: C): C => { const d = b[0] * b[0] + b[1] * b[1]; return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d]; };
const sub = (a: C, b: C): C => [a[0] - b[0], a[1] - b[1]];
const at = (v: Float64Array, k: number): C => [v[2 * k]!, v[2 * k + 1]!];

/** The eight points of a monodromy node in affine coordinates: P₁, P₂, P₃, then each traced point as the meet of its two lines. */
function affinePoints(p: Float64Array): C[][] {
  const cross = (u: C[], v: C[]): C[] => [0, 1, 2].map((i) => sub(mul(u[(i + 1) % 3]!, v[(i + 2) % 3]!), mul(u[(i + 2) % 3]!, v[(i + 1) % 3]!)));
  const homogeneous = [
    ...[0, 1, 2].map((i) => [0, 1, 2].map((a) => at(p, 3 * i + a))),
    ...TRACED.map((_, k) => cross([0, 1, 2].map((a) => at(p, 9 + 6 * k + a)), [0, 1, 2].map((a) => at(p, 9 + 6 * k + 3 + a)))),
  ];
  return homogeneous.map((h) => [div(h[0]!, h[2]!), div(h[1]!, h[2]!)]);
}

/** |f(x, y)| / Σ|c|·|monomial| for the page's cubic (x³ coefficient 1, then the unknown coefficients of a solution). */
function relativeValue(solution: Float64Array, [x, y]: C[]): number {
  const coefficients: C[] = [[1, 0], ...Array.from({ length: 9 }, (_, k) => at(solution, k))];
  let value: C = [0, 0], scale = 0;
  CUBIC_EXPONENTS.forEach(([i, j], m) => {
    let term = coefficients[m]!;
    for (let r = 0; r < i!; r++) term = mul(term, x!);
    for (let r = 0; r < j!; r++) term = mul(term, y!);
    value = [value[0] + term[0], value[1] + term[1]];
    scale += Math.hypot(...term);
  });
  return Math.hypot(...value) / scale;
}

// Twelve rational cubics pass through eight general points: N_3 = 12 (Kontsevich–Manin, Comm. Math. Phys. 164, 1994).
describe('rational cubics as parametrised maps, by monodromy', () => {
  it.each([1, 2, 3])('seed %i: discovery, not told the count, saturates at 12 maps', async (seed) => {
    const result = await cubicsByMonodromy(seed);
    expect(result.stop).toBe('saturated');
    expect(result.solutions).toHaveLength(12);
    expect(result.stats.failedPaths).toBe(0);
  });

  it('the 12 maps trace exactly the 12 nodal cubics the page’s implicit formulation finds through the same points', async () => {
    const result = await cubicsByMonodromy(1);
    const points = affinePoints(result.parameters);
    const parameters = Float64Array.from(points.flat(2));
    const report = await solveSystem(systemOf(rationalCubics), parameters, { seed: 5, start: 'multihomogeneous' });
    expect(report.solutions).toHaveLength(12);
    const t: C = [0.3, 0.7];
    const matches = result.solutions.map((x) => {
      const h = mapPoint(x, result.parameters, t);
      const point = [div(h[0]!, h[2]!), div(h[1]!, h[2]!)];
      const values = report.solutions.map((s) => relativeValue(s.point, point));
      const best = values.indexOf(Math.min(...values));
      expect(values[best]).toBeLessThan(1e-8);
      expect(values.filter((v) => v < 1e-4)).toHaveLength(1);
      return best;
    });
    expect(new Set(matches).size).toBe(12);
  });
});
