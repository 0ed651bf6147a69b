import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/distance-and-optimisation/eigenvectors-of-a-symmetric-ternary-cubic.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving for the eigenvectors of a symmetric ternary cubic tensor', () => {
  it.each(seeds(8))('random complex ternary cubic %i: 7 eigenvectors, the other 2 paths at infinity', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // ((d − 1)ⁿ − 1)/(d − 2) = 7 for n = 3, d = 3 (Cartwright–Sturmfels, Linear Algebra Appl. 438, 2013).
    expect(report.solutions).toHaveLength(7);
    // d − 1 = 2 paths end at infinity of the chart (our own derivation, on the page).
    expect(report.stats).toMatchObject({ tracked: 9, regular: 7, singular: 0, atInfinity: 2, failed: 0 });
  });

  it('the lamp’s brightness pattern: 7 eigenvectors, all real', async () => {
    const demo = demoInstance(definition, 'lamp-pattern');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(7);
    expect(solved.real).toBe(7); // measured on our demo data (no source)
    expect(drawnRealSolutions(definition, demo, solved)).toHaveLength(7);
  });
});
