import { describe, expect, it } from 'vitest';
import { mapParameters, mapUnknowns, parametrisedMapFormulation, parametrisedMapSeed, tracedPoints } from '../../../../generators/problems/rational-curves/parametrised-map.ts';
import { parametrisedMapSystem } from '../../../../generators/problems/rational-curves/maps-by-monodromy.ts';
import { bezoutBound, compileSystem, createRandom, multihomogeneousBound } from '../../../../src/engine/index.ts';

/** ‖F(x; p)‖∞ of the degree-d map system (packed complex x and p). */
function residual(degree: number, x: Float64Array, p: Float64Array): number {
  const compiled = compileSystem(parametrisedMapSystem(degree));
  const out = new Float64Array(2 * compiled.neq);
  compiled.evaluate(x, p, out, null, null);
  return Math.max(...Array.from(out, Math.abs));
}

describe('parametrised maps of degree d through 3d − 1 points', () => {
  it.each([
    // 3d − 1 points, 6d − 8 unknowns and equations (a rational curve of degree d moves in a (3d − 1)-dimensional family; common practice, no source).
    { degree: 3, points: 8, unknowns: 10 },
    { degree: 4, points: 11, unknowns: 16 },
    { degree: 5, points: 14, unknowns: 22 },
  ])('degree $degree: $points points, a square system of $unknowns unknowns', ({ degree, points, unknowns }) => {
    expect(mapParameters(degree)).toHaveLength(2 * points);
    expect(tracedPoints(degree)).toHaveLength(points - 3);
    expect(mapUnknowns(degree)).toHaveLength(unknowns);
    expect(parametrisedMapSystem(degree).equations).toHaveLength(unknowns);
  });

  it.each([
    // Read off the degrees (computed, common practice, no source): (d + 1)^(6d − 8), and with the map and each t_i as
    // groups the coefficient of a^(3d−4) Π b_i in Π (a + d·b_i)², that is (2d)^(3d − 4); the cubic page quotes 4^10 and 6^5.
    { degree: 3, bezout: 4 ** 10, multihomogeneous: 6 ** 5 },
    { degree: 4, bezout: 5 ** 16, multihomogeneous: 8 ** 8 },
  ])('degree $degree: Bézout bound $bezout, multihomogeneous bound $multihomogeneous', ({ degree, bezout, multihomogeneous }) => {
    const system = parametrisedMapSystem(degree);
    expect(bezoutBound(system)).toBe(bezout);
    expect(multihomogeneousBound(system)).toBe(multihomogeneous);
  });

  it.each([3, 4])('degree %i: the solution-first seed solves its system, and a moved t_i does not', (degree) => {
    const { parameters, solution } = parametrisedMapSeed(degree, createRandom(degree));
    expect(residual(degree, solution, parameters)).toBeLessThan(1e-10);
    const moved = Float64Array.from(solution);
    moved[moved.length - 2]! += 0.1;
    expect(residual(degree, moved, parameters)).toBeGreaterThan(1e-4);
  });

  it('refuses a degree below 3', () => {
    expect(() => tracedPoints(2)).toThrow(RangeError);
  });

  it('keeps the groups: the map first, then one group per traced point', () => {
    const f = parametrisedMapFormulation(4, 'test');
    expect(f.groups).toEqual([['lambda', 'mu', 'c1x', 'c1y', 'c1z', 'c2x', 'c2y', 'c2z'], ...[4, 5, 6, 7, 8, 9, 10, 11].map((i) => [`t${i}`])]);
  });
});
