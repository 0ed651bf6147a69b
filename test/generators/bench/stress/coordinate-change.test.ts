import { describe, expect, it } from 'vitest';
import { linearChange, scaledUnknowns, unchanged } from '../../../../generators/bench/stress/coordinate-change.ts';
import { stressSystem } from '../../../../generators/bench/stress/stress-system.ts';
import { denseFamily, hyperplaneExcessFamily } from '../../../../generators/bench/stress/stress-family.ts';
import { createRandom, multiplyComplex } from '../../../../src/engine/index.ts';
import { evaluate, type C } from '../../problems/shared/evaluate.ts';

const pairs = (v: Float64Array): C[] => Array.from({ length: v.length / 2 }, (_, k) => [v[2 * k]!, v[2 * k + 1]!]);

// The metamorphic identity g(φ⁻¹(x)) = f(x) for g(x) = f(φ(x)): the variant at the mapped point equals the base at the
// point, so the mapped base solutions are exactly the variant's solutions (worked out by hand).
describe.each([
  ['scaled ×40', () => scaledUnknowns(40)],
  ['scaled ×1000', () => scaledUnknowns(1e3)],
  ['scaled ×0.001', () => scaledUnknowns(1e-3)],
  ['linear change', () => linearChange(3, 11)],
] as const)('%s', (_, make) => {
  it.each([denseFamily([3, 3, 3]), hyperplaneExcessFamily([3, 2, 2])])('of $label: the variant at fromBase(x) equals the base system at x', (family) => {
    const base = stressSystem(family, unchanged(), 4), variant = stressSystem(family, make(), 4);
    // the same coefficients, after the change's own data (a linear change's matrix)
    expect(variant.parameters.subarray(variant.parameters.length - base.parameters.length)).toEqual(base.parameters);
    const random = createRandom(77);
    for (let trial = 0; trial < 5; trial++) {
      const x = new Float64Array(6);
      for (let j = 0; j < 3; j++) random.gaussianComplex(x, 2 * j);
      base.system.equations.forEach((f, i) => {
        const want = evaluate(f, pairs(x), pairs(base.parameters));
        const got = evaluate(variant.system.equations[i]!, pairs(variant.fromBase(x)), pairs(variant.parameters));
        expect(Math.hypot(got[0] - want[0], got[1] - want[1])).toBeLessThanOrEqual(1e-11 * Math.max(1, Math.hypot(...want)));
      });
    }
  });
});

describe('coordinate changes', () => {
  it('scaling multiplies every coordinate of a base solution by σ', () => {
    expect(Array.from(scaledUnknowns(40).fromBase(Float64Array.of(1, -2, 0.5, 3)))).toEqual([40, -80, 20, 120]);
    expect(Array.from(unchanged().fromBase(Float64Array.of(1, 2)))).toEqual([1, 2]);
  });

  it('the linear change maps back: A·fromBase(x) = x (relative 1e-13 for this well-conditioned A)', () => {
    const change = linearChange(4, 3);
    expect(change.condition).toBeLessThan(1e3);
    const x = Float64Array.of(1, 2, -3, 0.5, 0, 1, 4, -1), back = new Float64Array(8);
    multiplyComplex(change.matrix, change.fromBase(x), 4, back);
    back.forEach((v, k) => expect(v).toBeCloseTo(x[k]!, 12));
  });

  it('refuses a scale factor that is not positive and finite', () => {
    for (const sigma of [0, -2, Infinity, NaN]) expect(() => scaledUnknowns(sigma)).toThrow(RangeError);
  });
});
