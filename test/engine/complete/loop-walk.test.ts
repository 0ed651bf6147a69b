import { describe, expect, it } from 'vitest';
import type { PathEnd } from '../../../src/engine/homotopy.ts';
import * as ops from '../../../src/engine/expr/build.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { compiledLegTracker } from '../../../src/engine/complete/compiled-leg-tracker.ts';
import { triangleLegs, walkLoop } from '../../../src/engine/complete/loop-walk.ts';
import { createPointIndex } from '../../../src/engine/parameter/point-index.ts';
import type { ParameterLeg } from '../../../src/engine/parameter/gamma-arc.ts';
import type { LegTracker } from '../../../src/engine/parameter/route.ts';
import { randomParameterPoint } from '../../../src/engine/parameter/route.ts';
import { createRandom } from '../../../src/engine/random.ts';

const regular = (point: Float64Array): PathEnd => ({ outcome: 'regular', point, residual: 0, condition: 1, windingNumber: 1, steps: 1, rejectedSteps: 0, retries: 0 });
const failed = (point: Float64Array): PathEnd => ({ ...regular(point), outcome: 'failed', failure: 'step-underflow' });
const legs = triangleLegs(Float64Array.of(0, 0), Float64Array.of(1, 0), Float64Array.of(0, 1), createRandom(1));
const base = (...values: number[]) => { const index = createPointIndex(1); values.forEach((v) => index.add(Float64Array.of(v, 0))); return index; };

/** A scripted tracker: each leg maps a start's real part by `move` (safe or not); the last leg closes the loop. */
function scripted(move: (x: number, leg: number, safe: boolean) => number | null): LegTracker {
  return async (leg: ParameterLeg, starts, safe) => starts.map((s) => {
    const k = legs.indexOf(leg as (typeof legs)[number]);
    const y = move(s[0]!, k, safe);
    return y === null ? failed(s.slice()) : regular(Float64Array.of(y, 0));
  });
}

describe('walkLoop: one monodromy loop over a set of base points', () => {
  it('adds ends it does not hold and sends them around the same loop until it closes', async () => {
    // The loop acts as x ↦ x + 1 mod 3 on {0, 1, 2}: from {0} it finds 1, then 2.
    const index = base(0);
    const walk = await walkLoop(scripted((x, k) => (k === 2 ? (x + 1) % 3 : x)), legs, index);
    expect(index.points.map((p) => p[0])).toEqual([0, 1, 2]);
    expect(walk.added).toEqual([1, 2]);
    expect(walk.paths).toBe(9);
    expect(walk.routes.every((r) => r.ok && r.via.length === 3)).toBe(true);
  });
  it('only transports when told not to close', async () => {
    const index = base(0);
    const walk = await walkLoop(scripted((x, k) => (k === 2 ? x + 1 : x)), legs, index, false);
    expect(index.size).toBe(1);
    expect(walk.added).toEqual([]);
    expect(walk.routes[0]!.via[2]![0]).toBe(1);
  });
  it('counts a route that fails on any leg, and adds nothing from it', async () => {
    const index = base(0, 1);
    const walk = await walkLoop(scripted((x, k) => (x === 1 && k === 1 ? null : x)), legs, index);
    expect(walk.failedPaths).toBe(1);
    expect(walk.routes[1]!.ok).toBe(false);
    expect(walk.paths).toBe(5); // 3 legs for the good route, 2 for the failed one
  });
  it('re-tracks two routes that met with safe settings and believes them when they part', async () => {
    const index = base(0, 1);
    const walk = await walkLoop(scripted((x, k, safe) => (k === 2 && !safe ? 0 : x)), legs, index);
    expect(walk.jumps).toBe(2);
    expect(walk.unresolvedJumps).toBe(0);
    expect(walk.routes.map((r) => r.via[2]![0])).toEqual([0, 1]);
    expect(walk.paths).toBe(12);
  });
  it('drops both routes when they still meet after the safe re-track', async () => {
    const index = base(0, 1);
    const walk = await walkLoop(scripted((x, k) => (k === 2 ? 5 : x)), legs, index);
    expect(walk.unresolvedJumps).toBe(2);
    expect(walk.routes.every((r) => !r.ok && r.jumped)).toBe(true);
    expect(walk.failedPaths).toBe(0);
    expect(index.size).toBe(2); // the shared end is never believed
  });
});

// x⁴ + p·x + q = 0 has 4 distinct roots for general p, q (fundamental theorem of algebra; common practice, no source).
describe('walkLoop on a general quartic', () => {
  it('grows one root to all four over a few random loops', async () => {
    const x = ops.unknown('x', 0);
    const quartic = compileSystem({ unknowns: ['x'], parameters: ['p', 'q'], equations: [ops.add(ops.pow(x, 4), ops.mul(ops.param('p', 0), x), ops.param('q', 1))] });
    // Solution-first: x₀ = 1, p = 2 ⇒ q = −x₀⁴ − p·x₀ = −3.
    const p0 = Float64Array.of(2, 0, -3, 0);
    const index = createPointIndex(1);
    index.add(Float64Array.of(1, 0));
    const track = await compiledLegTracker(quartic);
    const random = createRandom(4);
    for (let loop = 0; loop < 6 && index.size < 4; loop++) await walkLoop(track, triangleLegs(p0, randomParameterPoint(2, random), randomParameterPoint(2, random), random), index);
    expect(index.size).toBe(4);
    for (const r of index.points) {
      const [a, b] = [r[0]!, r[1]!];
      const x2 = [a * a - b * b, 2 * a * b], x4 = [x2[0]! * x2[0]! - x2[1]! * x2[1]!, 2 * x2[0]! * x2[1]!];
      expect(Math.hypot(x4[0]! + 2 * a - 3, x4[1]! + 2 * b)).toBeLessThan(1e-12);
    }
  });
});
