import { describe, expect, it } from 'vitest';
import type { PathEnd } from '../../../src/engine/homotopy.ts';
import { mul, sub, unknown } from '../../../src/engine/expr/build.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { createAffineTools } from '../../../src/engine/solve/affine.ts';
import { toAffineEnd } from '../../../src/engine/solve/affine-end.ts';

// x − 2 = 0, x·y − 6 = 0 (hand arithmetic: the one solution (2, 3), Jacobian [[1, 0], [3, 2]], nonsingular).
const x = unknown('x', 0), y = unknown('y', 1);
const tools = createAffineTools(compileSystem({ unknowns: ['x', 'y'], parameters: [], equations: [sub(x, 2), sub(mul(x, y), 6)] }), new Float64Array(0));
const groups = [[0, 1, 2]]; // homotopy coordinates (X₀, X₁, h)
const end = (outcome: PathEnd['outcome'], X: number[]): PathEnd => ({ outcome, point: new Float64Array(X), residual: 0, condition: 1e12, windingNumber: 2, steps: 1, rejectedSteps: 0, retries: 0 });

describe('toAffineEnd', () => {
  it('dehomogenises a finite end: x = X / h, and keeps a regular end that solves the target', () => {
    const e = toAffineEnd(end('regular', [1, 0, 1.5, 0, 0.5, 0]), groups, 2, tools);
    expect(e.outcome).toBe('regular');
    expect(Array.from(e.point)).toEqual([2, 0, 3, 0]);
    expect(e.residual).toBe(0);
  });
  // A 'regular' verdict from the tracker (judged in the projective chart) must still solve the affine target; the
  // bitangent instance with seed 1002 once reported such an end, |x| ≈ 1.9e3, residual 3.5e3, as a 29th solution.
  it.each([
    ['near infinity (relative distance 1e-3 in the chart): at infinity', [1, 0, 1.5, 0, 1e-3, 0], 'at-infinity', undefined],
    ['away from infinity and from the solution (2, 3): failed', [1, 0, 1, 0, 0.5, 0], 'failed', 'no-convergence'],
  ])('re-judges a regular verdict at a point that does not solve the target, %s', (_, X, outcome, failure) => {
    const e = toAffineEnd(end('regular', X), groups, 2, tools);
    expect(e.outcome).toBe(outcome);
    expect(e.failure).toBe(failure);
  });
  it('counts a regular verdict near infinity where the target is singular at infinity (xy = 1, xy = 2) at infinity', () => {
    // No finite solution (hand arithmetic); at x = (1000, 1e-3) the Jacobian rows [y, x] coincide and |F| = 1.
    const parallel = createAffineTools(compileSystem({ unknowns: ['x', 'y'], parameters: [], equations: [sub(mul(x, y), 1), sub(mul(x, y), 2)] }), new Float64Array(0));
    const e = toAffineEnd(end('regular', [1, 0, 1e-6, 0, 1e-3, 0]), groups, 2, parallel);
    expect(e.outcome).toBe('at-infinity');
    expect(Array.from(e.point)).toEqual([1, 0, 1e-6, 0]);
  });
  it('re-judges a singular verdict at a clearly nonsingular solution as regular with winding number 1 (implicit function theorem)', () => {
    const e = toAffineEnd(end('singular', [1, 0, 1.5, 0, 0.5, 0]), groups, 2, tools);
    expect(e.outcome).toBe('regular');
    expect(e.windingNumber).toBe(1);
  });
  it('keeps a singular verdict away from a solution', () => {
    const e = toAffineEnd(end('singular', [1, 0, 1, 0, 0.5, 0]), groups, 2, tools);
    expect(e.outcome).toBe('singular');
  });
  it('gives an end at infinity as its direction scaled to max |Xⱼ| = 1', () => {
    const e = toAffineEnd(end('at-infinity', [2, 0, 0, -4, 0, 0]), groups, 2, tools);
    expect(Array.from(e.point)).toEqual([0.5, 0, 0, -1]);
  });
});
