import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/distance-and-optimisation/euclidean-distance-degree-of-a-quadric-surface.ts';
import { coefficientNames } from '../../../../generators/problems/shared/monomials.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound, multihomogeneousBound } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);
// The ellipsoid x²/4 + y² + z² = 1 seen from (0.5, 0, 0) (our own worked example): the vertex (2, 0, 0) is critical
// with λ = (2 − 0.5)/f_x = 1.5/1 = 1.5; the point (0, 1, 0) is on the surface but not critical.
const ellipsoid: Record<string, number> = { ...Object.fromEntries(coefficientNames('q', 3, 2).map((n) => [n, ({ q200: 0.25, q020: 1, q002: 1, q000: -1 } as Record<string, number>)[n] ?? 0])), a: 0.5, b: 0, c: 0 };

describe('critical distances to a quadric surface: the formulation', () => {
  it('has the Bézout bound 16 and the two-homogeneous bound 6 (our own derivation)', () => {
    expect(bezoutBound(system)).toBe(16);
    expect(multihomogeneousBound(system)).toBe(6);
  });

  it('is solved by the vertex (2, 0, 0) with λ = 1.5, not by the point (0, 1, 0) of the surface', () => {
    const q = paramsFrom(system.parameters, ellipsoid);
    expect(largestResidual(system.equations, real([2, 0, 0, 1.5]), q)).toBeLessThan(1e-14);
    for (const lambda of [-1, 0, 1]) expect(largestResidual(system.equations, real([0, 1, 0, lambda]), q)).toBeGreaterThan(0.4);
  });

  it('stores the point (x, y, z) and drops the multiplier', () => {
    expect(Array.from(definition.formulation.coordinates!.map(Float64Array.from([1, 0, 2, 0, 3, 0, 4, 0])))).toEqual([1, 0, 2, 0, 3, 0]);
  });
});

describe('solving for the critical distances to a quadric surface', () => {
  it.each(seeds(8))('random complex quadric and point %i: 6 critical points, every two-homogeneous path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // The Euclidean distance degree of a general quadric surface in 3-space is 2n = 6 (Draisma–Horobeț–Ottaviani–Sturmfels–Thomas, Found. Comput. Math. 16, 2016).
    expect(report.solutions).toHaveLength(6);
    expect(report.stats).toMatchObject({ tracked: 6, regular: 6, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the lamp inside the egg-shaped shell: 6 critical points, all real, each drawn with its normal segment', async () => {
    const demo = demoInstance(definition, 'lamp-in-a-shell');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(6);
    expect(solved.real).toBe(6); // measured on our demo data (no source)
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.map((i) => i.layer))).toEqual(new Array(6).fill(['normals', 'solution']));
  });
});
