import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/singular-members-of-a-pencil-of-sextics.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound, multihomogeneousBound } from '../../../../src/engine/index.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe('singular members of a pencil of plane sextics: the formulation', () => {
  it('has Bézout bound 6³ = 216 and two-homogeneous bound 3 · 5² = 75 (our own derivation)', () => {
    const system = systemOf(definition);
    expect(bezoutBound(system)).toBe(216);
    expect(multihomogeneousBound(system)).toBe(75);
  });
});

describe('solving for the singular members of a pencil of plane sextics', () => {
  it.each(seeds(6))('random complex pencil %i: 75 singular members, every two-homogeneous path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // 3(d − 1)² = 75 for d = 6: the degree of the discriminant (Gelfand–Kapranov–Zelevinsky 1994, Boole's formula).
    expect(report.solutions).toHaveLength(75);
    expect(report.stats).toMatchObject({ tracked: 75, regular: 75, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('random complex pencil 1 from the total-degree start: 75 singular members, the other 141 paths at infinity', async () => {
    const { report } = await solveInstance(definition, randomInstance(1), 'total-degree');
    // The same published count (Gelfand–Kapranov–Zelevinsky 1994); the 141 = 216 − 75 surplus paths must all end at infinity.
    expect(report.solutions).toHaveLength(75);
    expect(report.stats).toMatchObject({ tracked: 216, regular: 75, atInfinity: 141, failed: 0 });
  });

  it('the woven lattice: 75 singular members, 33 of them real, each node drawn', async () => {
    const demo = demoInstance(definition, 'woven-lattice');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(75);
    expect(solved.real).toBe(33); // measured on our demo data (no source)
    expect(drawnRealSolutions(definition, demo, solved)).toHaveLength(33);
  });
});
