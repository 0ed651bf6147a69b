import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/schubert/lines-meeting-four-lines.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { drawnRealSolutions, demoInstance, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);

describe('lines meeting four lines: the formulation', () => {
  it('is satisfied by a planted transversal and not by a nearby line', () => {
    // L1, L2 arbitrary; the transversal joins P = L1(0.7) and Q = L2(−1.2); L3 and L4 pass through points of PQ.
    const q: Record<string, number> = { px1: 0, py1: 0, pz1: 0, dx1: 1, dy1: 0.2, dz1: 0.1, px2: 1, py2: 2, pz2: 3, dx2: 0.3, dy2: 1, dz2: -0.4 };
    const P = [0.7, 0.14, 0.07], Q = [1 - 0.36, 2 - 1.2, 3 + 0.48];
    const at = (u: number) => P.map((v, m) => v + u * (Q[m]! - v));
    [[3, 0.4, [0.2, -1, 0.5]], [4, 2.5, [1, 0.7, 0.3]]].forEach(([k, u, d]) => {
      const X = at(u as number);
      ['x', 'y', 'z'].forEach((a, m) => { q[`p${a}${k}`] = X[m]! + 2 * (d as number[])[m]!; q[`d${a}${k}`] = (d as number[])[m]!; });
    });
    const params = paramsFrom(system.parameters, q);
    expect(largestResidual(system.equations, real([0.7, -1.2]), params)).toBeLessThan(1e-12);
    expect(largestResidual(system.equations, real([0.8, -1.2]), params)).toBeGreaterThan(1e-3);
  });

  it('has bidegree (1, 1) in the groups {s}, {t}: two-homogeneous bound 2', () => {
    expect(system.groups).toEqual([[0], [1]]);
  });
});

// Two lines meet four general lines in space (Schubert, Kalkül der abzählenden Geometrie, 1879).
describe('solving lines meeting four lines', () => {
  it.each(seeds(20))('random complex instance %i, total degree: 2 transversals, the other 2 paths at infinity', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed), 'total-degree');
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.solutions).toHaveLength(2);
    expect(report.stats).toMatchObject({ tracked: 4, regular: 2, singular: 0, atInfinity: 2, failed: 0 });
  });

  it.each(seeds(20))('random complex instance %i, two-homogeneous: 2 paths, both transversals', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed), 'multihomogeneous');
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.multihomogeneousBound).toBe(2);
    expect(report.solutions).toHaveLength(2);
    expect(report.stats).toMatchObject({ tracked: 2, regular: 2, failed: 0 });
  });

  it('the four wires: 2 real rods', async () => {
    const solved = await solveInstance(definition, demoInstance(definition, 'four-wires'));
    expect(solved.report.solutions).toHaveLength(2);
    expect(solved.real).toBe(2);
    expect(drawnRealSolutions(definition, demoInstance(definition, 'four-wires'), solved).flat().filter((i) => i.layer === 'solution')).toHaveLength(2);
  });
});
