import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/intersections/points-common-to-three-cubic-surfaces.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving for the points common to three cubic surfaces', () => {
  it.each(seeds(8))('three random complex cubic surfaces %i: 27 common points, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // Bézout's theorem in 3-space (Fulton, Intersection Theory, 1984): three general surfaces of degree d meet in d³ = 27 points.
    expect(report.solutions).toHaveLength(27);
    expect(report.stats).toMatchObject({ tracked: 27, regular: 27, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('three folded sheets: all 27 common points real, each drawn with its drop line', async () => {
    const demo = demoInstance(definition, 'folded-sheets');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(27);
    expect(solved.real).toBe(27); // built so: a perturbed grid of real points (our own data)
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.map((i) => i.layer))).toEqual(new Array(27).fill(['solution', 'depth']));
  });
});
