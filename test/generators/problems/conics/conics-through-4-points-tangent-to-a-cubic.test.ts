import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/conics/conics-through-4-points-tangent-to-a-cubic.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';
import { directionClusterSizes, endsAtInfinity } from './conic-curve-ends.ts';

// 12 = 6·1 + 3·2: Chasles's rule m·μ + d·ν (C. R. Acad. Sci. Paris 58, 1864) for a cubic (class 6, Plücker 1839) on the
// pencil of conics through 4 points (μ = 1 conic through a fifth point, ν = 2 tangent to a line: Chasles 1864).
const COUNT = 12;

describe('conics through 4 points tangent to a cubic', () => {
  it('states the published count 12', () => {
    expect(definition.trueCount.value).toBe(COUNT);
  });

  it.each(seeds(6))('random complex data %i: 12 conics, the 3 other paths at infinity through the cubic’s points at infinity', async (seed) => {
    const instance = randomInstance(seed);
    const { report } = await solveInstance(definition, instance);
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.multihomogeneousBound).toBe(15);
    expect(report.solutions).toHaveLength(COUNT);
    // The 15 − 12 = 3 surplus paths: one conic of the pencil through each of the cubic's 3 points at infinity (our own
    // derivation, stated in the excess note).
    expect(report.stats).toMatchObject({ tracked: 15, regular: COUNT, singular: 0, excess: 0, atInfinity: 3, failed: 0 });
    for (const end of endsAtInfinity(definition, instance, report, 3)) {
      expect(end.curveForm).toBeLessThan(1e-6);
      expect(end.conicForm).toBeLessThan(1e-6);
    }
    // each point at infinity once
    expect(directionClusterSizes(endsAtInfinity(definition, instance, report, 3).map((e) => e.direction))).toEqual(new Array(3).fill(1));
  });

  it('from the total-degree start (36 paths) it finds the same 12', async () => {
    const { report } = await solveInstance(definition, randomInstance(7), 'total-degree');
    expect(report.bezoutBound).toBe(36);
    expect(report.solutions).toHaveLength(COUNT);
    // every surplus path at infinity (our own runs; the excess note says so)
    expect(report.stats).toMatchObject({ tracked: 36, regular: COUNT, singular: 0, excess: 0, atInfinity: 24, failed: 0 });
  });

  it('the skating cones: 12 conics, 8 real, each drawn with its contact point', async () => {
    const demo = demoInstance(definition, 'skating-cones');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(COUNT);
    // 8 real: measured on our own configuration (no published source).
    expect(solved.real).toBe(8);
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.map((i) => i.layer))).toEqual(new Array(8).fill(['solution', 'tangency']));
  });
});
