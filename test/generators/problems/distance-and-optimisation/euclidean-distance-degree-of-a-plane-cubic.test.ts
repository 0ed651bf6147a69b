import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/distance-and-optimisation/euclidean-distance-degree-of-a-plane-cubic.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving for the critical distances from a point to a cubic', () => {
  it.each(seeds(8))('random complex cubic and point %i: 9 critical points, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // The Euclidean distance degree of a general plane cubic (d = 3) is d² = 9 (Draisma–Horobeț–Ottaviani–Sturmfels–Thomas, Found. Comput. Math. 16, 2016).
    expect(report.solutions).toHaveLength(9);
    expect(report.stats).toMatchObject({ tracked: 9, regular: 9, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the hut by the trail: 9 critical points, 7 real, each drawn with its segment', async () => {
    const demo = demoInstance(definition, 'hut-and-trail');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(9);
    expect(solved.real).toBe(7); // measured on our demo data (no source)
    expect(drawnRealSolutions(definition, demo, solved)).toHaveLength(7);
  });
});
