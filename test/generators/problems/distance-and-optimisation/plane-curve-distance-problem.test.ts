import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/distance-and-optimisation/euclidean-distance-degree-of-an-ellipse.ts';
import { planeCurveDistanceProblem } from '../../../../generators/problems/distance-and-optimisation/plane-curve-distance-problem.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { demoInstance, solveInstance } from '../shared/solve.ts';

const system = systemOf(definition);
// x²/9 + y²/4 = 1 (coefficients x², xy, y², x, y, 1) seen from (0.5, 0): the vertex (3, 0) is critical, the
// co-vertex (0, 2) is not (our own worked example).
const ellipse: Record<string, number> = { c20: 1 / 9, c11: 0, c02: 1 / 4, c10: 0, c01: 0, c00: -1, a: 0.5, b: 0 };

describe('critical points of the distance to a plane curve: the formulation', () => {
  it.each([[2, 4], [3, 9], [4, 16]])('degree %i: two equations of degree d, Bézout bound %i = d² (our own derivation)', (d, bound) => {
    const curve = planeCurveDistanceProblem({
      slug: `curve-${d}`, degree: d, title: 'curve', curve: 'a curve', tags: [], genericSeed: 1, realNote: '', view: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 },
      demo: { id: 'zero', label: 'zero', description: 'zero', seed: 1, coefficients: new Array(((d + 1) * (d + 2)) / 2).fill(1), point: [0, 0] },
    });
    expect(bezoutBound(systemOf(curve))).toBe(bound);
  });

  it('is solved by the vertex (3, 0) of x²/9 + y²/4 = 1 seen from (0.5, 0), not by the co-vertex (0, 2)', () => {
    const q = paramsFrom(system.parameters, ellipse);
    expect(largestResidual(system.equations, real([3, 0]), q)).toBeLessThan(1e-14);
    expect(largestResidual(system.equations, real([0, 2]), q)).toBeGreaterThan(0.1);
  });

  it('loses two of the four to the isotropic points at infinity on a circle: 2 critical points (ED degree of a circle, from memory)', async () => {
    const circle = planeCurveDistanceProblem({
      slug: 'circle', degree: 2, title: 'circle', curve: 'a circle', tags: [], genericSeed: 1, realNote: '', view: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 },
      demo: { id: 'circle', label: 'circle', description: 'circle', seed: 5, coefficients: [1, 0, 1, 0, 0, -1], point: [0.3, 0.2] },
    });
    const solved = await solveInstance(circle, demoInstance(circle, 'circle'));
    expect(solved.report.solutions).toHaveLength(2);
    expect(solved.report.stats.failed).toBe(0);
    expect(solved.real).toBe(2);
  });

  it('draws each real critical point with the straight segment from the given point', () => {
    const [segment, point] = definition.drawing!.solution([3, 0], ellipse) as unknown as [{ points: [number, number][] }, { x: number; y: number }];
    expect(segment.points).toEqual([[0.5, 0], [3, 0]]);
    expect([point.x, point.y]).toEqual([3, 0]);
  });
});
