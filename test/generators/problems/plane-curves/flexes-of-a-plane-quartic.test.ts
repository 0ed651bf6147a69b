import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/flexes-of-a-plane-quartic.ts';
import { demoInstance, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('solving flexes of a plane quartic', () => {
  it.each(seeds(8))('random complex quartic %i: 24 flexes, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // A smooth plane quartic has 3d(d − 2) = 24 flexes (Plücker, Theorie der algebraischen Curven, 1839).
    expect(report.solutions).toHaveLength(24);
    expect(report.stats).toMatchObject({ tracked: 24, regular: 24, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the four-lobed biscuit cutter: 24 flexes, 8 real, the most a real quartic can have', async () => {
    const solved = await solveInstance(definition, demoInstance(definition, 'four-lobed-biscuit'));
    expect(solved.report.solutions).toHaveLength(24);
    // At most d(d − 2) = 8 real flexes (Klein, Math. Ann. 10, 1876; from memory).
    expect(solved.real).toBe(8);
  });
});
