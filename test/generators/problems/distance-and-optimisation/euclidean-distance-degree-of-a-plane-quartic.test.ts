import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/distance-and-optimisation/euclidean-distance-degree-of-a-plane-quartic.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving for the critical distances from a point to a quartic', () => {
  it.each(seeds(8))('random complex quartic and point %i: 16 critical points, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // The Euclidean distance degree of a general plane quartic (d = 4) is d² = 16 (Draisma–Horobeț–Ottaviani–Sturmfels–Thomas, Found. Comput. Math. 16, 2016).
    expect(report.solutions).toHaveLength(16);
    expect(report.stats).toMatchObject({ tracked: 16, regular: 16, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the fountain in the four-lobed pond: 16 critical points, 16 real, each drawn with its segment', async () => {
    const demo = demoInstance(definition, 'fountain-in-a-pond');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(16);
    expect(solved.real).toBe(16); // measured on our demo data (no source)
    expect(drawnRealSolutions(definition, demo, solved)).toHaveLength(16);
  });
});
