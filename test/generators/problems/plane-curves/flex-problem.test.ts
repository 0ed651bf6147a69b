import { describe, expect, it } from 'vitest';
import { flexProblem } from '../../../../generators/problems/plane-curves/flex-problem.ts';
import { monomialExponents } from '../../../../generators/problems/shared/monomials.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';

/** The flex page of degree d with the demo curve y = x³ + x⁴ (as a curve of degree d), which has a flex at the origin. */
function withGraphDemo(d: number) {
  const coefficients = monomialExponents(2, d).map(([i, j]) => (i === 0 && j === 1 ? 1 : (j === 0 && (i === 3 || i === 4)) ? -1 : 0));
  return flexProblem({ slug: `flexes-${d}`, degree: d, noun: `curve of degree ${d}`, genericSeed: 1, realNote: '', view: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 }, demo: { id: 'graph', label: 'graph', description: 'graph', seed: 1, coefficients } });
}

describe('the flex problem of a plane curve of degree d', () => {
  it.each([[4, 24], [5, 45], [6, 72]])('degree %i: the curve and its Hessian, Bézout bound %i = 3d(d − 2) (our own derivation)', (d, bound) => {
    expect(bezoutBound(systemOf(withGraphDemo(d)))).toBe(bound);
  });

  it.each([4, 5])('degree %i: the flex of y = x³ + x⁴ at the origin solves both equations, the ordinary point (1, 2) only the first', (d) => {
    const definition = withGraphDemo(d);
    const system = systemOf(definition);
    const q = paramsFrom(system.parameters, definition.instances[1]!.parameters as Record<string, number>);
    expect(largestResidual(system.equations, real([0, 0]), q)).toBeLessThan(1e-12);
    expect(largestResidual(system.equations.slice(0, 1), real([1, 2]), q)).toBeLessThan(1e-12);
    expect(largestResidual(system.equations.slice(1), real([1, 2]), q)).toBeGreaterThan(1);
  });
});
