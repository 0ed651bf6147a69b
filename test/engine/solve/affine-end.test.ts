import { describe, expect, it } from 'vitest';
import type { PathEnd } from '../../../src/engine/homotopy.ts';
import { mul, sub, unknown } from '../../../src/engine/expr/build.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { createAffineTools } from '../../../src/engine/solve/affine.ts';
import { toAffineEnd } from '../../../src/engine/solve/affine-end.ts';
import { noScaling } from '../../../src/engine/start/scaling.ts';

// x − 2 = 0, x·y − 6 = 0 (hand arithmetic: the one solution (2, 3), Jacobian [[1, 0], [3, 2]], nonsingular).
const x = unknown('x', 0), y = unknown('y', 1);
const compiled = compileSystem({ unknowns: ['x', 'y'], parameters: [], equations: [sub(x, 2), sub(mul(x, y), 6)] });
const tools = createAffineTools(compiled, new Float64Array(0));
const units = noScaling(2);
const groups = [[0, 1, 2]]; // homotopy coordinates (Y₀, Y₁, h)
const end = (outcome: PathEnd['outcome'], X: number[], residual = 0): PathEnd => ({ outcome, point: new Float64Array(X), residual, condition: 1e12, windingNumber: 2, steps: 1, rejectedSteps: 0, retries: 0 });

describe('toAffineEnd', () => {
  it('dehomogenises a finite end: x = X / h, and keeps a regular end that solves the target', () => {
    const e = toAffineEnd(end('regular', [1, 0, 1.5, 0, 0.5, 0]), groups, units, tools);
    expect(e.outcome).toBe('regular');
    expect(Array.from(e.point)).toEqual([2, 0, 3, 0]);
    expect(e.residual).toBe(0);
  });

  it('multiplies by the natural units: x_j = 2^c_j · Y_j / h', () => {
    // the same system written in x' = x / 8 (so the solution is x' = 1/4): units c = (−3, 0) map Y back
    const scaled = createAffineTools(compileSystem({ unknowns: ['x', 'y'], parameters: [], equations: [sub(mul(8, x), 2), sub(mul(8, x, y), 6)] }), new Float64Array(0), { variables: [-3, 0], equations: [0, 0] });
    const e = toAffineEnd(end('regular', [1, 0, 1.5, 0, 0.5, 0]), groups, { variables: [-3, 0], equations: [0, 0] }, scaled);
    expect(e.outcome).toBe('regular');
    expect(Array.from(e.point)).toEqual([0.25, 0, 3, 0]);
  });

  // A 'regular' verdict from the tracker must still solve the affine target; otherwise the path is re-tracked. Its
  // distance to infinity never decides (the tracker decides infinity from its own evidence).
  it.each([
    ['near infinity (relative distance 1e-3 in the chart)', [1, 0, 1.5, 0, 1e-3, 0]],
    ['away from infinity and from the solution (2, 3)', [1, 0, 1, 0, 0.5, 0]],
  ])('calls a regular verdict at a point that solves neither target failed, %s', (_, X) => {
    const e = toAffineEnd(end('regular', X, 0.1), groups, units, tools);
    expect(e.outcome).toBe('failed');
    expect(e.failure).toBe('no-convergence');
  });

  it('calls a regular verdict at a root of the homogenised target whose dehomogenisation solves nothing at infinity', () => {
    // xy = 1, xy = 2 have no finite solution (hand arithmetic); the homogenised pair has the root (1 : 0 : 0)
    const parallel = createAffineTools(compileSystem({ unknowns: ['x', 'y'], parameters: [], equations: [sub(mul(x, y), 1), sub(mul(x, y), 2)] }), new Float64Array(0));
    const e = toAffineEnd(end('regular', [1, 0, 1e-6, 0, 1e-9, 0], 1e-12), groups, units, parallel);
    expect(e.outcome).toBe('at-infinity');
    expect(e.direction).toBe(true);
  });

  it('keeps a regular end however far out it is, when it solves the target (x − 10⁹ = 0, y − 1 = 0)', () => {
    const far = createAffineTools(compileSystem({ unknowns: ['x', 'y'], parameters: [], equations: [sub(x, 1e9), sub(y, 1)] }), new Float64Array(0));
    const e = toAffineEnd(end('regular', [1, 0, 1e-9, 0, 1e-9, 0]), groups, units, far);
    expect(e.outcome).toBe('regular');
    expect(e.point[0]).toBeCloseTo(1e9, -1);
  });

  it('re-judges a singular verdict at a clearly nonsingular solution as regular with winding number 1 (implicit function theorem)', () => {
    const e = toAffineEnd(end('singular', [1, 0, 1.5, 0, 0.5, 0]), groups, units, tools);
    expect(e.outcome).toBe('regular');
    expect(e.windingNumber).toBe(1);
  });

  it('keeps a singular verdict away from a solution (the review re-tracks an undecided one)', () => {
    const e = toAffineEnd(end('singular', [1, 0, 1, 0, 0.5, 0]), groups, units, tools);
    expect(e.outcome).toBe('singular');
  });

  it('keeps a singular verdict at a singular solution: x² = y² = 0 at the origin', () => {
    const double = createAffineTools(compileSystem({ unknowns: ['x', 'y'], parameters: [], equations: [mul(x, x), mul(y, y)] }), new Float64Array(0));
    const e = toAffineEnd(end('singular', [1e-9, 0, -1e-9, 0, 0.5, 0]), groups, units, double);
    expect(e.outcome).toBe('singular');
  });

  it('gives an end at infinity as its direction scaled to max |Yⱼ| = 1, marked as a direction', () => {
    const e = toAffineEnd(end('at-infinity', [2, 0, 0, -4, 0, 0]), groups, units, tools);
    expect(Array.from(e.point)).toEqual([0.5, 0, 0, -1]);
    expect(e.direction).toBe(true);
  });
});
