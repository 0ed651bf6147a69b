import { describe, expect, it } from 'vitest';
import { pencilProblem, singularMembers } from '../../../../generators/problems/plane-curves/pencil-problem.ts';
import { coefficientNames, monomialExponents } from '../../../../generators/problems/shared/monomials.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound, multihomogeneousBound } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';

/** The pencil page of degree d whose demo P is the nodal curve y² = x²(x + 1) (node at the origin) and Q = x^d + y^d + 1. */
function nodalDemo(d: number) {
  const exponents = monomialExponents(2, d);
  const p = exponents.map(([i, j]) => (i === 0 && j === 2 ? 1 : j === 0 && i === 2 ? -1 : j === 0 && i === 3 ? -1 : 0));
  const q = exponents.map(([i, j]) => ((i === d && j === 0) || (i === 0 && j === d) || (i === 0 && j === 0) ? 1 : 0));
  return pencilProblem({ slug: `pencil-${d}`, degree: d, nouns: 'curves', genericSeed: 1, view: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 }, demo: { id: 'nodal', label: 'nodal', description: 'nodal', seed: 1, p, q } });
}

describe('singular members of a pencil of plane curves of degree d', () => {
  // 3(d − 1)², the degree of the discriminant of ternary forms (Gelfand–Kapranov–Zelevinsky 1994, Boole's formula).
  it.each([[2, 3], [3, 12], [4, 27], [5, 48], [6, 75]])('degree %i: %i singular members', (d, count) => {
    expect(singularMembers(d)).toBe(count);
  });

  it.each([[3, 27, 12], [4, 64, 27], [5, 125, 48]])('degree %i: Bézout bound %i, two-homogeneous bound %i (our own derivation)', (d, bezout, twoHomogeneous) => {
    const system = systemOf(nodalDemo(d));
    expect(bezoutBound(system)).toBe(bezout);
    expect(multihomogeneousBound(system)).toBe(twoHomogeneous);
  });

  it.each([3, 4, 5])('degree %i: the node of the member λ = 0 at the origin solves, a smooth point of it does not', (d) => {
    const definition = nodalDemo(d);
    const system = systemOf(definition);
    const q = paramsFrom(system.parameters, definition.instances[1]!.parameters as Record<string, number>);
    expect(largestResidual(system.equations, real([0, 0, 0]), q)).toBeLessThan(1e-14);
    // (3, 6) lies on y² = x²(x + 1) but is no node of it.
    expect(largestResidual(system.equations, real([3, 6, 0]), q)).toBeGreaterThan(1);
  });

  it('draws a real node with the two branches of its member', () => {
    const definition = nodalDemo(3);
    const names = [...coefficientNames('p', 2, 3), ...coefficientNames('q', 2, 3)];
    const c = Object.fromEntries(names.map((n) => [n, definition.instances[1]!.parameters![n] as number]));
    const items = definition.drawing!.solution([0, 0, 0], c);
    expect(items.map((i) => i.layer)).toEqual(['solution', 'branches', 'branches']);
  });
});
