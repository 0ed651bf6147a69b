import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/distance-and-optimisation/eigenvectors-of-a-symmetric-ternary-quartic.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving for the eigenvectors of a symmetric ternary quartic tensor', () => {
  it.each(seeds(8))('random complex ternary quartic %i: 13 eigenvectors, the other 3 paths at infinity', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // ((d − 1)ⁿ − 1)/(d − 2) = 13 for n = 3, d = 4 (Cartwright–Sturmfels, Linear Algebra Appl. 438, 2013).
    expect(report.solutions).toHaveLength(13);
    // d − 1 = 3 paths end at infinity of the chart (our own derivation, on the page).
    expect(report.stats).toMatchObject({ tracked: 16, regular: 13, singular: 0, atInfinity: 3, failed: 0 });
  });

  it('the carved block’s stiffness: 13 eigenvectors, all real', async () => {
    const demo = demoInstance(definition, 'grain-stiffness');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(13);
    expect(solved.real).toBe(13); // measured on our demo data (no source)
    expect(drawnRealSolutions(definition, demo, solved)).toHaveLength(13);
  });
});
