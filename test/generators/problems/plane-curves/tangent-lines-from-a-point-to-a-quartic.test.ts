import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/tangent-lines-from-a-point-to-a-quartic.ts';
import { coefficientNames } from '../../../../generators/problems/shared/monomials.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);
// The quartic x⁴ + y⁴ = 1 and the point (2, 0): the tangent from (2, 0) touching at (x, y) satisfies
// x⁴ + y⁴ = 1 and the polar 2x³ = 1 (our own worked example), so x = 2^(−1/3), y = (1 − x⁴)^(1/4).
const fermat: Record<string, number> = { ...Object.fromEntries(coefficientNames('c', 2, 4).map((n) => [n, n === 'c40' || n === 'c04' ? 1 : n === 'c00' ? -1 : 0])), a: 2, b: 0 };
const contact = [2 ** (-1 / 3), (1 - 2 ** (-4 / 3)) ** 0.25];

describe('tangent lines from a point to a plane quartic: the formulation', () => {
  it('has the Bézout bound 12 = 4 · 3 (the curve and the polar cubic; our own derivation)', () => {
    expect(bezoutBound(system)).toBe(12);
  });

  it('is solved by the point of contact of a tangent from (2, 0) to x⁴ + y⁴ = 1, not by another point of the curve', () => {
    const q = paramsFrom(system.parameters, fermat);
    expect(largestResidual(system.equations, real(contact), q)).toBeLessThan(1e-12);
    expect(largestResidual(system.equations, real([0, 1]), q)).toBeGreaterThan(1);
  });

  it('draws the tangent as the line through the point and its point of contact', () => {
    const [line, point] = definition.drawing!.solution(contact, fermat) as unknown as [{ a: number; b: number; c: number }, { x: number; y: number }];
    for (const [x, y] of [[2, 0], [point.x, point.y]]) expect(line.a * x! + line.b * y! + line.c).toBeCloseTo(0, 12);
  });
});

describe('solving for the tangent lines from a point to a plane quartic', () => {
  it.each(seeds(8))('random complex quartic and point %i: 12 tangent lines, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // The class of a smooth plane curve of degree d is d(d − 1) = 12 for d = 4 (Plücker, Theorie der algebraischen Curven, 1839).
    expect(report.solutions).toHaveLength(12);
    expect(report.stats).toMatchObject({ tracked: 12, regular: 12, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the lamp above the four-lobed screen: 12 tangents, 8 real, each drawn with its point of contact', async () => {
    const demo = demoInstance(definition, 'lamp-above-a-screen');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(12);
    expect(solved.real).toBe(8); // measured on our demo data (no source)
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.map((i) => i.layer))).toEqual(new Array(8).fill(['solution', 'tangency']));
  });
});
