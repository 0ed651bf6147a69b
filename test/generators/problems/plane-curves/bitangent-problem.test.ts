import { describe, expect, it } from 'vitest';
import { bitangentCount, bitangentProblem, residualNames } from '../../../../generators/problems/plane-curves/bitangent-problem.ts';
import quarticPage from '../../../../generators/problems/plane-curves/bitangents-of-a-plane-quartic.ts';
import { coefficientNames } from '../../../../generators/problems/shared/monomials.ts';
import { createRandom } from '../../../../src/engine/index.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { evaluate, type C } from '../shared/evaluate.ts';

/** The factory's page for degree d with placeholder demo data (only its formulation is used here). */
function page(d: number) {
  return bitangentProblem({
    slug: `bitangents-${d}`, degree: d, noun: 'curve', genericSeed: 1, realNote: '', measuredExcess: '', bounds: { bezout: 0, multihomogeneous: 0 },
    view: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 },
    demo: { id: 'demo', label: 'demo', description: 'demo', seed: 1, coefficients: coefficientNames('c', 2, d).map(() => 0.1), sigma: 0.1 },
  });
}

describe('bitangents of a plane curve of degree d', () => {
  // ½d(d − 2)(d − 3)(d + 3) (Plücker, Theorie der algebraischen Curven, 1839): 28 for quartics, 120 for quintics,
  // 324 for sextics; 0 for a cubic, which has none.
  it.each([[3, 0], [4, 28], [5, 120], [6, 324]])('degree %i: %i bitangents', (d, count) => {
    expect(bitangentCount(d)).toBe(count);
  });

  it.each([[4, []], [5, ['gamma']], [6, ['gamma1', 'gamma2']]] as const)('degree %i: residual unknowns %j', (d, names) => {
    expect(residualNames(d)).toEqual(names);
    expect(systemOf(page(d)).unknowns).toEqual(['m', 'k', 'alpha', 'beta', ...names]);
  });

  it('at degree 4 gives the same equations as the quartic page, at random complex points', () => {
    const [general, quartic] = [systemOf(page(4)), systemOf(quarticPage)];
    expect(general.parameters).toEqual(quartic.parameters);
    const rng = createRandom(4);
    const draw = (n: number): C[] => Array.from({ length: n }, () => [rng.normal(), rng.normal()]);
    for (let trial = 0; trial < 5; trial++) {
      const [x, p] = [draw(4), draw(quartic.parameters.length)];
      quartic.equations.forEach((e, i) => {
        const [a, b] = [evaluate(e, x, p), evaluate(general.equations[i]!, x, p)];
        expect(Math.hypot(a[0] - b[0], a[1] - b[1])).toBeLessThan(1e-9 * (1 + Math.hypot(...a)));
      });
    }
  });
});
