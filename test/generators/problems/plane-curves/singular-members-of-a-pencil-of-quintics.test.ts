import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/singular-members-of-a-pencil-of-quintics.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving for the singular members of a pencil of plane quintics', () => {
  it.each(seeds(8))('random complex pencil %i: 48 singular members, every two-homogeneous path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // 3(d − 1)² = 48 for d = 5: the degree of the discriminant (Gelfand–Kapranov–Zelevinsky 1994, Boole's formula).
    expect(report.solutions).toHaveLength(48);
    expect(report.stats).toMatchObject({ tracked: 48, regular: 48, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the laser sweep: 48 singular members, 32 of them real, each node drawn', async () => {
    const demo = demoInstance(definition, 'laser-sweep');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(48);
    expect(solved.real).toBe(32); // measured on our demo data (no source)
    expect(drawnRealSolutions(definition, demo, solved)).toHaveLength(32);
  });
});
