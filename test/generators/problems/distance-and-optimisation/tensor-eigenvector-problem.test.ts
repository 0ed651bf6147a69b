import { describe, expect, it } from 'vitest';
import { eigenvectorCount, tensorEigenvectorProblem } from '../../../../generators/problems/distance-and-optimisation/tensor-eigenvector-problem.ts';
import { monomialExponents } from '../../../../generators/problems/shared/monomials.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';

/** The page of order d with the Fermat form x^d + y^d + z^d as its demo (our own example). */
function fermat(d: number) {
  const coefficients = monomialExponents(2, d).map(([i, j]) => (i === d || j === d || i! + j! === 0 ? 1 : 0));
  return tensorEigenvectorProblem({ slug: `eigen-${d}`, degree: d, noun: 'form', genericSeed: 1, view: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 }, demo: { id: 'fermat', label: 'fermat', description: 'fermat', seed: 1, coefficients } });
}

describe('eigenvectors of a symmetric tensor', () => {
  // ((d − 1)ⁿ − 1)/(d − 2), and n for d = 2 (Cartwright–Sturmfels, Linear Algebra Appl. 438, 2013).
  it.each([[3, 2, 3], [2, 3, 3], [2, 4, 4], [3, 3, 7], [3, 4, 13], [3, 5, 21], [4, 3, 15]])('n = %i, d = %i: %i eigenvectors', (n, d, count) => {
    expect(eigenvectorCount(n, d)).toBe(count);
  });

  it.each([[3, 9], [4, 16]])('order %i: two equations of degree d on the chart, Bézout bound %i = d² (our own derivation)', (d, bound) => {
    expect(bezoutBound(systemOf(fermat(d)))).toBe(bound);
  });

  it.each([3, 4])('order %i: (0, 0, 1), (1, 0, 1) and (1, 1, 1) are eigenvectors of x^d + y^d + z^d, (2, 0, 1) is not', (d) => {
    const definition = fermat(d);
    const system = systemOf(definition);
    const q = paramsFrom(system.parameters, definition.instances[1]!.parameters as Record<string, number>);
    for (const v of [[0, 0], [1, 0], [1, 1]]) expect(largestResidual(system.equations, real(v), q)).toBeLessThan(1e-14);
    expect(largestResidual(system.equations, real([2, 0]), q)).toBeGreaterThan(1);
  });
});
