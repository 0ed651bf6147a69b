import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/conics/conics-through-4-points-tangent-to-a-quartic.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';
import { directionClusterSizes, endsAtInfinity } from './conic-curve-ends.ts';

// 20 = 12·1 + 4·2: Chasles's rule m·μ + d·ν (C. R. Acad. Sci. Paris 58, 1864) for a quartic (class 12, Plücker 1839) on the
// pencil of conics through 4 points (μ = 1 conic through a fifth point, ν = 2 tangent to a line: Chasles 1864).
const COUNT = 20;

describe('conics through 4 points tangent to a quartic', () => {
  it('states the published count 20', () => {
    expect(definition.trueCount.value).toBe(COUNT);
  });

  it.each(seeds(6))('random complex data %i: 20 conics, the 4 other paths at infinity through the quartic’s points at infinity', async (seed) => {
    const instance = randomInstance(seed);
    const { report } = await solveInstance(definition, instance);
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.multihomogeneousBound).toBe(24);
    expect(report.solutions).toHaveLength(COUNT);
    // The 24 − 20 = 4 surplus paths: one conic of the pencil through each of the quartic's 4 points at infinity (our own
    // derivation, stated in the excess note).
    expect(report.stats).toMatchObject({ tracked: 24, regular: COUNT, singular: 0, excess: 0, atInfinity: 4, failed: 0 });
    for (const end of endsAtInfinity(definition, instance, report, 4)) {
      expect(end.curveForm).toBeLessThan(1e-6);
      expect(end.conicForm).toBeLessThan(1e-6);
    }
    // each point at infinity once
    expect(directionClusterSizes(endsAtInfinity(definition, instance, report, 4).map((e) => e.direction))).toEqual(new Array(4).fill(1));
  });

  it('from the total-degree start (60 paths) it finds the same 20', async () => {
    const { report } = await solveInstance(definition, randomInstance(7), 'total-degree');
    expect(report.bezoutBound).toBe(60);
    expect(report.solutions).toHaveLength(COUNT);
    // every surplus path at infinity (our own runs; the excess note says so)
    expect(report.stats).toMatchObject({ tracked: 60, regular: COUNT, singular: 0, excess: 0, atInfinity: 40, failed: 0 });
  });

  it('the lagoon buoys: 20 conics, 16 real, each drawn with its contact point', async () => {
    const demo = demoInstance(definition, 'lagoon-buoys');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(COUNT);
    // 16 real: measured on our own configuration (no published source).
    expect(solved.real).toBe(16);
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.map((i) => i.layer))).toEqual(new Array(16).fill(['solution', 'tangency']));
  });
});
