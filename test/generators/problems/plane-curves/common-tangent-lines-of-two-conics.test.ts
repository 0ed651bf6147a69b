import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/common-tangent-lines-of-two-conics.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);
// The unit circles about (0, 0) and (3, 0) (coefficients x², xy, y², x, y, 1): the line y = 1, that is
// 0·x − y + 1 = 0, touches both at (0, 1) and (3, 1) (our own worked example).
const circles: Record<string, number> = { p20: 1, p11: 0, p02: 1, p10: 0, p01: 0, p00: -1, q20: 1, q11: 0, q02: 1, q10: -6, q01: 0, q00: 8 };

describe('common tangent lines of two conics: the formulation', () => {
  it('has the Bézout bound 4 = 2 · 2 (one dual conic per conic; our own derivation)', () => {
    expect(bezoutBound(system)).toBe(4);
  });

  it('is solved by the common tangent y = 1 of two unit circles, not by a line tangent to one only', () => {
    const q = paramsFrom(system.parameters, circles);
    expect(largestResidual(system.equations, real([0, -1]), q)).toBeLessThan(1e-14);
    // x = −1 (u = 1, v = 0) touches the first circle only.
    expect(largestResidual(system.equations.slice(0, 1), real([1, 0]), q)).toBeLessThan(1e-14);
    expect(largestResidual(system.equations.slice(1), real([1, 0]), q)).toBeGreaterThan(1);
  });

  it('draws the line with its two points of contact, (0, 1) and (3, 1)', () => {
    const items = definition.drawing!.solution([0, -1], circles);
    expect(items.filter((i) => i.shape === 'point').map((i) => [(i as { x: number }).x, (i as { y: number }).y])).toEqual([[0, 1], [3, 1]].map((p) => p.map((v) => expect.closeTo(v, 12))));
  });
});

describe('solving for the common tangent lines of two conics', () => {
  it.each(seeds(10))('two random complex conics %i: 4 common tangents, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // Two general conics have 4 common tangents: their dual conics meet in 2 · 2 points (Bézout's theorem, Fulton, Algebraic Curves, 1969).
    expect(report.solutions).toHaveLength(4);
    expect(report.stats).toMatchObject({ tracked: 4, regular: 4, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the two medallions: 4 common tangents, all real, each touching both ovals at real points', async () => {
    const demo = demoInstance(definition, 'two-medallions');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(4);
    // Two disjoint real ovals have 4 real common tangents (classical; from memory).
    expect(solved.real).toBe(4);
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.map((i) => i.layer))).toEqual(new Array(4).fill(['solution', 'tangency', 'tangency']));
  });
});
