import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/singular-members-of-a-pencil-of-quartics.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving for the singular members of a pencil of plane quartics', () => {
  it.each(seeds(8))('random complex pencil %i: 27 singular members, every two-homogeneous path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // 3(d − 1)² = 27 for d = 4: the degree of the discriminant (Gelfand–Kapranov–Zelevinsky 1994, Boole's formula).
    expect(report.solutions).toHaveLength(27);
    expect(report.stats).toMatchObject({ tracked: 27, regular: 27, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the animated contour line: 27 singular members, 23 of them real, each node drawn', async () => {
    const demo = demoInstance(definition, 'contour-animation');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(27);
    expect(solved.real).toBe(23); // measured on our demo data (no source)
    expect(drawnRealSolutions(definition, demo, solved)).toHaveLength(23);
  });
});
