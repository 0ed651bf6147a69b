import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/singular-members-of-a-pencil-of-cubics.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving for the singular members of a pencil of plane cubics', () => {
  it.each(seeds(8))('random complex pencil %i: 12 singular members, every two-homogeneous path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // 3(d − 1)² = 12 for d = 3: the degree of the discriminant (Gelfand–Kapranov–Zelevinsky 1994, Boole's formula).
    expect(report.solutions).toHaveLength(12);
    expect(report.stats).toMatchObject({ tracked: 12, regular: 12, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the type designer’s blend: 12 singular members, 12 of them real, each node drawn', async () => {
    const demo = demoInstance(definition, 'glyph-blend');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(12);
    expect(solved.real).toBe(12); // measured on our demo data (no source)
    expect(drawnRealSolutions(definition, demo, solved)).toHaveLength(12);
  });
});
