import { describe, expect, it } from 'vitest';
import { solveSystem } from '../../../src/engine/solve/solve-system.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { randomSystem } from '../../../generators/bench/engine-systems.ts';

const seeds = Array.from({ length: 20 }, (_, i) => 1000 + i);

// Bézout 1779; Fulton, Algebraic Curves (1969), ch. 5: general curves of degrees d, e in the plane meet in d·e
// points, all finite and transversal for general coefficients; three general quadric surfaces meet in 2·2·2 = 8.
describe.each([
  ['two general plane conics meet in 4 points', 2, 2, 4],
  ['two general plane cubics meet in 9 points', 2, 3, 9],
  ['three general quadric surfaces meet in 8 points', 3, 2, 8],
] as const)('%s', (_, n, d, count) => {
  it.each(seeds)('seed %i: every path ends at a distinct finite nonsingular solution', async (seed) => {
    const system = randomSystem(createRandom(seed), n, d);
    const report = await solveSystem(system, new Float64Array(0), { seed });
    expect(report.bezoutBound).toBe(count);
    expect(report.stats).toMatchObject({ tracked: count, regular: count, singular: 0, atInfinity: 0, failed: 0 });
    expect(report.solutions).toHaveLength(count);
    expect(report.singular).toHaveLength(0);
    for (const s of report.solutions) {
      expect(s.residual).toBeLessThan(1e-12);
      expect(s.multiplicity).toBe(1);
      expect(s.condition).toBeLessThan(1e10);
    }
    expect(report.solutions.flatMap((s) => s.paths).sort((a, b) => a - b)).toEqual(Array.from({ length: count }, (_, i) => i));
  });
});
