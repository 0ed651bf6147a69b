import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/common-tangent-lines-of-two-cubics.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);
// Two cubics of our own (coefficients x³, x²y, xy², y³, x², xy, y², x, y, 1), each with a horizontal tangent on y = 1:
// x³ + 2x² + y − 1 = 0 at (0, 1) and (x − 3)²(x − 1) + y − 1 = 0 at (3, 1). The line 0·x − y + 1 = 0 touches both
// (our own worked example).
const zero = Object.fromEntries(system.parameters.map((n) => [n, 0]));
const cubics: Record<string, number> = { ...zero, p30: 1, p20: 2, p01: 1, p00: -1, q30: 1, q20: -7, q10: 15, q01: 1, q00: -10 };

describe('common tangent lines of two cubics: the formulation', () => {
  it('has the Bézout bound 324 = (3 · 2 · 3)² (degrees of the six equations; our own count)', () => {
    expect(bezoutBound(system)).toBe(324);
  });

  it('is solved by the common tangent y = 1 with its contact points (0, 1) and (3, 1)', () => {
    const q = paramsFrom(system.parameters, cubics);
    expect(largestResidual(system.equations, real([0, -1, 0, 1, 3, 1]), q)).toBeLessThan(1e-14);
  });

  it('is not solved by a line through a point of the first cubic that only crosses it there', () => {
    // x = −1 (u = 1, v = 0) meets x³ + 2x² + y − 1 = 0 at (−1, 0), where the gradient is (−1, 1): not tangent.
    const q = paramsFrom(system.parameters, cubics);
    expect(largestResidual(system.equations.slice(0, 2), real([1, 0, -1, 0, 3, 1]), q)).toBeLessThan(1e-14);
    expect(largestResidual(system.equations.slice(2, 3), real([1, 0, -1, 0, 3, 1]), q)).toBeCloseTo(1, 12);
  });

  it('draws the line with its two points of contact, (0, 1) and (3, 1)', () => {
    const items = definition.drawing!.solution([0, -1, 0, 1, 3, 1], cubics);
    expect(items.map((i) => i.layer)).toEqual(['solution', 'tangency', 'tangency']);
    expect(items.filter((i) => i.shape === 'point').map((i) => [(i as { x: number }).x, (i as { y: number }).y])).toEqual([[0, 1], [3, 1]]);
  });
});

describe('solving for the common tangent lines of two cubics', () => {
  it.each(seeds(6))('two random complex cubics %i: 36 common tangents, every other path at infinity', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    // A smooth cubic has class d(d − 1) = 6 (Plücker 1834; Theorie der algebraischen Curven, 1839), so the two dual
    // sextics meet in 6 · 6 = 36 points (Bézout's theorem, Fulton, Algebraic Curves, 1969).
    expect(report.solutions).toHaveLength(36);
    // The 324 − 36 = 288 surplus paths all end at infinity (our own runs; the page's excess note says so).
    expect(report.stats).toMatchObject({ tracked: 324, regular: 36, singular: 0, excess: 0, atInfinity: 288, failed: 0 });
  });

  it('the two beaded strokes: 36 common tangents, 18 real, each drawn with its two points of contact', async () => {
    const demo = demoInstance(definition, 'two-beaded-strokes');
    const solved = await solveInstance(definition, demo);
    // 36: Plücker's class 6 and Bézout, as above.
    expect(solved.report.solutions).toHaveLength(36);
    // 18 real: measured on our own configuration (no published source; the most we met over 150 random placements).
    expect(solved.real).toBe(18);
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.map((i) => i.layer))).toEqual(new Array(18).fill(['solution', 'tangency', 'tangency']));
  });
});
