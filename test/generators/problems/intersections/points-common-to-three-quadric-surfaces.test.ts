import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/intersections/points-common-to-three-quadric-surfaces.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving for the points common to three quadric surfaces', () => {
  it.each(seeds(8))('three random complex quadric surfaces %i: 8 common points, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // Bézout's theorem in 3-space (Fulton, Intersection Theory, 1984): three general surfaces of degree d meet in d³ = 8 points.
    expect(report.solutions).toHaveLength(8);
    expect(report.stats).toMatchObject({ tracked: 8, regular: 8, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('three glass shells: all 8 common points real, each drawn with its drop line', async () => {
    const demo = demoInstance(definition, 'glass-shells');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(8);
    expect(solved.real).toBe(8); // built so: a perturbed grid of real points (our own data)
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.map((i) => i.layer))).toEqual(new Array(8).fill(['solution', 'depth']));
  });
});
