import { describe, expect, it } from 'vitest';
import { surfaceTripleProblem } from '../../../../generators/problems/intersections/surface-triple.ts';
import { monomialExponents } from '../../../../generators/problems/shared/monomials.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';

/** Surfaces x^d = 1, y^d = 1, z^d = 1 (our own example): their common real point (1, 1, 1). */
function powers(d: number) {
  const exponents = monomialExponents(3, d);
  const pure = (axis: number) => exponents.map((e) => (e[axis] === d ? 1 : e.every((k) => k === 0) ? -1 : 0));
  return surfaceTripleProblem({ slug: `surfaces-${d}`, degree: d, noun: 'test', genericSeed: 1, frame: 1, demo: { id: 'powers', label: 'powers', description: 'powers', seed: 1, surfaces: [pure(0), pure(1), pure(2)] } });
}

describe('points common to three surfaces of degree d', () => {
  it.each([[2, 8], [3, 27], [4, 64]])('degree %i: Bézout bound %i', (d, bound) => {
    expect(bezoutBound(systemOf(powers(d)))).toBe(bound);
  });

  it.each([2, 3])('degree %i: (1, 1, 1) solves x^d = y^d = z^d = 1, (1, 1, 0.5) does not', (d) => {
    const definition = powers(d);
    const system = systemOf(definition);
    const q = paramsFrom(system.parameters, definition.instances[1]!.parameters as Record<string, number>);
    expect(largestResidual(system.equations, real([1, 1, 1]), q)).toBeLessThan(1e-14);
    expect(largestResidual(system.equations, real([1, 1, 0.5]), q)).toBeGreaterThan(0.5);
  });
});
