import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/conics/conics-through-3-points-tangent-to-a-line-and-a-cubic.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';
import { directionClusterSizes, endsAtInfinity } from './conic-curve-ends.ts';

// 24 = 6·2 + 3·4: Chasles's rule m·μ + d·ν (C. R. Acad. Sci. Paris 58, 1864) for a cubic (class 6, Plücker 1839) on the
// conics through 3 points tangent to a line (μ = 2 through a fourth point, ν = 4 tangent to a second line: Chasles 1864).
const COUNT = 24;

describe('conics through 3 points tangent to a line and a cubic', () => {
  it('states the published count 24', () => {
    expect(definition.trueCount.value).toBe(COUNT);
  });

  it.each(seeds(6))('random complex data %i: 24 conics, the 6 other paths at infinity through the cubic’s points at infinity', async (seed) => {
    const instance = randomInstance(seed);
    const { report } = await solveInstance(definition, instance);
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.multihomogeneousBound).toBe(30);
    expect(report.solutions).toHaveLength(COUNT);
    // The 30 − 24 = 6 surplus paths: two conics tangent to the line through each of the cubic's 3 points at infinity (our own
    // derivation, stated in the excess note).
    expect(report.stats).toMatchObject({ tracked: 30, regular: COUNT, singular: 0, excess: 0, atInfinity: 6, failed: 0 });
    for (const end of endsAtInfinity(definition, instance, report, 3)) {
      expect(end.curveForm).toBeLessThan(1e-6);
      expect(end.conicForm).toBeLessThan(1e-6);
    }
    // each point at infinity twice
    expect(directionClusterSizes(endsAtInfinity(definition, instance, report, 3).map((e) => e.direction))).toEqual(new Array(3).fill(2));
  });

  it('from the total-degree start (72 paths) it finds the same 24', async () => {
    const { report } = await solveInstance(definition, randomInstance(7), 'total-degree');
    expect(report.bezoutBound).toBe(72);
    expect(report.solutions).toHaveLength(COUNT);
    // every surplus path at infinity (our own runs; the excess note says so)
    expect(report.stats).toMatchObject({ tracked: 72, regular: COUNT, singular: 0, excess: 0, atInfinity: 48, failed: 0 });
  });

  it('the garden wall: 24 conics, 14 real, each drawn with its contacts with the cubic and the line', async () => {
    const demo = demoInstance(definition, 'garden-wall');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(COUNT);
    // 14 real: measured on our own configuration (no published source).
    expect(solved.real).toBe(14);
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.map((i) => i.layer))).toEqual(new Array(14).fill(['solution', 'tangency', 'tangency']));
  });
});
