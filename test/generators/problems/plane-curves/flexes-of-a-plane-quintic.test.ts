import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/flexes-of-a-plane-quintic.ts';
import { demoInstance, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving flexes of a plane quintic', () => {
  it.each(seeds(8))('random complex quintic %i: 45 flexes, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // A smooth plane quintic has 3d(d − 2) = 45 flexes (Plücker, Theorie der algebraischen Curven, 1839).
    expect(report.solutions).toHaveLength(45);
    expect(report.stats).toMatchObject({ tracked: 45, regular: 45, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the pond and causeway quintic: 45 flexes, 13 real, within the bound of 15', async () => {
    const solved = await solveInstance(definition, demoInstance(definition, 'pond-and-causeway'));
    expect(solved.report.solutions).toHaveLength(45);
    // At most d(d − 2) = 15 real flexes (Klein, Math. Ann. 10, 1876; from memory); 13 is our demo's measured count.
    expect(solved.real).toBe(13);
    expect(solved.real).toBeLessThanOrEqual(15);
  });
});
