import { afterAll, describe, expect, it } from 'vitest';
import * as ops from '../../../src/engine/expr/build.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { createNodePool } from '../../../src/engine/pool/node-pool.ts';
import { COMPILED_LEG_MODULE } from '../../../src/engine/parameter/compiled-leg-module.ts';
import { createPoolLegTracker } from '../../../src/engine/parameter/pool-tracker.ts';
import { createModuleLegTracker } from '../../../src/engine/parameter/module-tracker.ts';

// x³ = p: from p = 8 (roots 2, 2ω, 2ω²) to p = −1 + i; the roots of a complex number (common practice, no source).
const x = ops.unknown('x', 0);
const cube = compileSystem({ unknowns: ['x'], parameters: ['p'], equations: [ops.sub(ops.pow(x, 3), ops.param('p', 0))] });
const ref = { url: COMPILED_LEG_MODULE, constants: { source: cube.source, shape: { neq: 1, n: 1, np: 1 } } };
const starts = [0, 1, 2].map((k) => Float64Array.of(2 * Math.cos((2 * Math.PI * k) / 3), 2 * Math.sin((2 * Math.PI * k) / 3)));
const leg = { from: Float64Array.of(8, 0), to: Float64Array.of(-1, 1), gamma: [0.6, 0.8] as const };
const pool = createNodePool(2);
afterAll(() => pool.terminate());

describe('the pool leg tracker', () => {
  it('gives the same ends as tracking on this thread, in start order', async () => {
    const here = await (await createModuleLegTracker(ref))(leg, starts, false);
    const there = await createPoolLegTracker(pool, ref)(leg, starts, false);
    expect(there.map((e) => e.outcome)).toEqual(['regular', 'regular', 'regular']);
    there.forEach((e, i) => e.point.forEach((v, j) => expect(v).toBeCloseTo(here[i]!.point[j]!, 12)));
  });
  it('serves overlapping calls on the shared workers, each with its own ends, so none is lost', async () => {
    const track = createPoolLegTracker(pool, ref);
    const results = await Promise.all([track(leg, starts, false), track(leg, starts.slice(0, 1), true), track(leg, starts, false)]);
    expect(results.map((r) => r.length)).toEqual([3, 1, 3]);
    expect(results[1]![0]!.outcome).toBe('regular');
    results[2]!.forEach((e, i) => e.point.forEach((v, j) => expect(v).toBe(results[0]![i]!.point[j])));
    results[1]![0]!.point.forEach((v, j) => expect(v).toBeCloseTo(results[0]![0]!.point[j]!, 10));
  });
});
