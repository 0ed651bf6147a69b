import { describe, expect, it } from 'vitest';
import { curveExcessFamily, denseFamily, hyperplaneExcessFamily } from '../../../../generators/bench/stress/stress-family.ts';
import { unchanged } from '../../../../generators/bench/stress/coordinate-change.ts';
import { stressSystem } from '../../../../generators/bench/stress/stress-system.ts';
import { bezoutBound, degree } from '../../../../src/engine/index.ts';
import { evaluate, type C } from '../../problems/shared/evaluate.ts';

describe.each([
  // Bézout's theorem for generic dense systems (Cox–Little–O'Shea 2005, ch. 3): ∏ d_i
  [denseFamily([6, 6, 6]), [6, 6, 6], 216],
  [denseFamily(Array.from({ length: 10 }, () => 2)), Array.from({ length: 10 }, () => 2), 1024],
  // ℓ·g_i: ∏(d_i − 1) isolated (argument in stress-family.ts)
  [hyperplaneExcessFamily([4, 4, 4]), [4, 4, 4], 27],
  // q₁a_i + q₂b_i: e³ + 6e², checked by Singular (test/engine/stress/isolated-counts.sing: 7, 32, 81)
  [curveExcessFamily(1), [3, 3, 3], 7],
  [curveExcessFamily(2), [4, 4, 4], 32],
  [curveExcessFamily(3), [5, 5, 5], 81],
] as const)('%s', (family, degrees, expected) => {
  it(`has equations of degrees ${degrees.join(',')} and expects ${expected} isolated solutions`, () => {
    const s = stressSystem(family, unchanged(), 1);
    expect(s.system.equations.map((f) => degree(f))).toEqual(degrees);
    expect(bezoutBound(s.system)).toBe(degrees.reduce((p, d) => p * d, 1));
    expect(family.expected).toBe(expected);
  });
});

describe('the hyperplane excess family', () => {
  it('vanishes on the whole hyperplane ℓ = 0 (ℓ = c0·x1 + c1·x2 + c2·x3 + c3, drawn first)', () => {
    const s = stressSystem(hyperplaneExcessFamily([3, 3, 3]), unchanged(), 2);
    const p: C[] = Array.from({ length: s.parameters.length / 2 }, (_, k) => [s.parameters[2 * k]!, s.parameters[2 * k + 1]!]);
    const x: C[] = [[0.3, -1.2], [2, 0.5], [0, 0]];
    // x3 = −(c0·x1 + c1·x2 + c3) / c2
    const sum: C = [0, 1, 3].reduce<C>((acc, k) => {
      const [a, b] = k === 3 ? [1, 0] : x[k]!;
      return [acc[0] + p[k]![0] * a - p[k]![1] * b, acc[1] + p[k]![0] * b + p[k]![1] * a];
    }, [0, 0]);
    const [cr, ci] = p[2]!, d = cr * cr + ci * ci;
    x[2] = [-(sum[0] * cr + sum[1] * ci) / d, -(sum[1] * cr - sum[0] * ci) / d];
    for (const f of s.system.equations) expect(Math.hypot(...evaluate(f, x, p))).toBeLessThan(1e-12);
  });

  it('refuses a degree below 2 (ℓ·g needs g of degree ≥ 1)', () => {
    expect(() => hyperplaneExcessFamily([3, 1])).toThrow(RangeError);
    expect(() => curveExcessFamily(0)).toThrow(RangeError);
  });
});
