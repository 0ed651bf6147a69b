import { describe, expect, it } from 'vitest';
import * as ops from '../../../src/engine/expr/build.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { byRoundedCoordinates, refineRecovered } from '../../../src/engine/complete/recovered.ts';

// x² = p: the two square roots ±√p (common practice, no source).
const x = ops.unknown('x', 0);
const squareRoot = compileSystem({ unknowns: ['x'], parameters: ['p'], equations: [ops.sub(ops.pow(x, 2), ops.param('p', 0))] });
const p = Float64Array.of(4, 0);

describe('refineRecovered', () => {
  it('refines near-solutions by Newton, keeps them sorted, and rejects what is no solution', () => {
    const { recovered, rejected } = refineRecovered(squareRoot, p, [Float64Array.of(2 + 1e-6, 1e-7), Float64Array.of(-2 - 3e-7, 0), Float64Array.of(0, 0)]);
    expect(rejected).toBe(1); // x = 0: singular Jacobian, residual 4
    expect(recovered.map((r) => r.point[0])).toEqual([-2, 2]);
    for (const r of recovered) {
      expect(r.residual).toBeLessThan(1e-15);
      expect(Math.abs(r.point[1]!)).toBeLessThan(1e-15);
      expect(r.condition).toBeLessThan(10);
    }
  });
  it('does not modify the candidates it is given', () => {
    const c = Float64Array.of(2.001, 0);
    refineRecovered(squareRoot, p, [c]);
    expect(c[0]).toBe(2.001);
  });
});

describe('byRoundedCoordinates', () => {
  it('orders by real then imaginary parts, and ignores differences beyond 9 significant digits', () => {
    expect(byRoundedCoordinates(Float64Array.of(1, 2), Float64Array.of(1, 3))).toBeLessThan(0);
    expect(byRoundedCoordinates(Float64Array.of(-1, 5), Float64Array.of(1, 0))).toBeLessThan(0);
    expect(byRoundedCoordinates(Float64Array.of(1 + 1e-12, 2), Float64Array.of(1, 2))).toBe(0);
  });
});
