import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/distance-and-optimisation/euclidean-distance-degree-of-an-ellipse.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving for the critical distances from a point to a ellipse', () => {
  it.each(seeds(8))('random complex ellipse and point %i: 4 critical points, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // The Euclidean distance degree of a general conic (d = 2) is d² = 4 (Draisma–Horobeț–Ottaviani–Sturmfels–Thomas, Found. Comput. Math. 16, 2016).
    expect(report.solutions).toHaveLength(4);
    expect(report.stats).toMatchObject({ tracked: 4, regular: 4, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the island in the oval lagoon: 4 critical points, 4 real, each drawn with its segment', async () => {
    const demo = demoInstance(definition, 'lagoon-island');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(4);
    // A point inside the evolute of an ellipse has 4 real normals to it (classical, Apollonius; from memory).
    expect(solved.real).toBe(4);
    expect(drawnRealSolutions(definition, demo, solved)).toHaveLength(4);
  });
});
