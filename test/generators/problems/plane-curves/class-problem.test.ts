import { describe, expect, it } from 'vitest';
import { classOfCurve, classProblem } from '../../../../generators/problems/plane-curves/class-problem.ts';
import { monomialExponents } from '../../../../generators/problems/shared/monomials.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound } from '../../../../src/engine/index.ts';

/** The page of degree d for the curve x^d + y^d = 1 and the point (2, 0) (only the shape matters here). */
function fermatPage(d: number) {
  const coefficients = monomialExponents(2, d).map(([i, j]) => ((i === d && j === 0) || (i === 0 && j === d) ? 1 : i === 0 && j === 0 ? -1 : 0));
  return classProblem({ slug: `class-${d}`, degree: d, noun: 'curve', genericSeed: 1, view: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 }, demo: { id: 'fermat', label: 'fermat', description: 'fermat', seed: 1, coefficients, point: [2, 0] } });
}

describe('tangent lines from a point to a plane curve of degree d', () => {
  // The class d(d − 1) of a smooth plane curve (Plücker, Theorie der algebraischen Curven, 1839): a conic 2, a cubic 6.
  it.each([[2, 2], [3, 6], [4, 12], [5, 20], [6, 30]])('degree %i: class %i', (d, count) => {
    expect(classOfCurve(d)).toBe(count);
  });

  it.each([3, 4, 5, 6])('degree %i: the curve and its polar give the Bézout bound d(d − 1) (our own derivation)', (d) => {
    const page = fermatPage(d);
    expect(bezoutBound(systemOf(page))).toBe(classOfCurve(d));
    expect(page.title).toBe(`The ${classOfCurve(d)} tangent lines from a point to a plane curve`);
  });
});
