import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/tangent-lines-from-a-point-to-a-quintic.ts';
import { coefficientNames } from '../../../../generators/problems/shared/monomials.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);
// The quintic x⁵ + y⁵ = 1 and the point (2, 0): the tangent from (2, 0) touching at (x, y) satisfies x⁵ + y⁵ = 1
// and the polar 2·5x⁴ − 5 = 0 (our own worked example), so x = 2^(−1/4), y = (1 − x⁵)^(1/5).
const fermat: Record<string, number> = { ...Object.fromEntries(coefficientNames('c', 2, 5).map((n) => [n, n === 'c50' || n === 'c05' ? 1 : n === 'c00' ? -1 : 0])), a: 2, b: 0 };
const contact = [2 ** (-1 / 4), (1 - 2 ** (-5 / 4)) ** 0.2];

describe('tangent lines from a point to a plane quintic: the formulation', () => {
  it('has the Bézout bound 20 = 5 · 4 (the curve and the polar quartic; our own derivation)', () => {
    expect(bezoutBound(system)).toBe(20);
  });

  it('is solved by the point of contact of a tangent from (2, 0) to x⁵ + y⁵ = 1, not by another point of the curve', () => {
    const q = paramsFrom(system.parameters, fermat);
    expect(largestResidual(system.equations, real(contact), q)).toBeLessThan(1e-12);
    expect(largestResidual(system.equations, real([0, 1]), q)).toBeGreaterThan(1);
  });
});

describe('solving for the tangent lines from a point to a plane quintic', () => {
  it.each(seeds(8))('random complex quintic and point %i: 20 tangent lines, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // The class of a smooth plane curve of degree d is d(d − 1) = 20 for d = 5 (Plücker, Theorie der algebraischen Curven, 1839).
    expect(report.solutions).toHaveLength(20);
    expect(report.stats).toMatchObject({ tracked: 20, regular: 20, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the floodlight among five hedges: 20 tangents, all real, each drawn with its point of contact', async () => {
    const demo = demoInstance(definition, 'floodlight-among-hedges');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(20);
    expect(solved.real).toBe(20); // measured on our demo data (no source); the class 20 bounds it
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.map((i) => i.layer))).toEqual(new Array(20).fill(['solution', 'tangency']));
  });
});
