import { afterAll, describe, expect, it } from 'vitest';
import { loadEngine } from '../../../generators/pipeline/real-engine.ts';
import type { ProblemDefinition } from '../../../src/atlas/definition.ts';
import { COMPILED_LEG_MODULE, compileSystem, ENGINE_VERSION, exprBuilders as ops, type ParameterProblem } from '../../../src/engine/index.ts';
import { problems } from '../../../generators/problems/index.ts';

describe('the production engine wiring', () => {
  it('carries the engine version and a strategy for every solver kind the registry uses', async () => {
    const engine = await loadEngine();
    expect(engine.version).toBe(ENGINE_VERSION);
    const kinds = new Set(problems.map((p) => p.solver?.kind ?? 'total-degree'));
    for (const kind of kinds) expect(Object.keys(engine.strategies), kind).toContain(kind);
  });

  it.each([['total-degree', true], ['multihomogeneous', true], ['parameter-homotopy', false]])('%s can be sharded: %s', async (kind, shardable) => {
    expect((await loadEngine()).strategies[kind]!.shardable).toBe(shardable);
  });
});

// x⁶⁴ = p from p = 1 (the 64th roots of unity) to p = −1 + i/2: 64 distinct roots (the roots of a complex number,
// common practice, no source). 64 points are enough for the certifier to use its workers.
const DEGREE = 64;
const x = ops.unknown('x', 0);
const shown = { unknowns: ['x'], parameters: ['p'], equations: [ops.sub(ops.pow(x, DEGREE), ops.param('p', 0))] };
const compiled = compileSystem(shown);
const roots = Array.from({ length: DEGREE }, (_, k) => Float64Array.of(Math.cos((2 * Math.PI * k) / DEGREE), Math.sin((2 * Math.PI * k) / DEGREE)));
const problem: ParameterProblem = {
  shown,
  working: { url: COMPILED_LEG_MODULE, constants: { source: compiled.source, shape: { neq: 1, n: 1, np: 1 } } },
  start: { parameters: Float64Array.of(1, 0), solutions: roots },
  toShown: (p) => p.slice(),
};
const definition = { solver: { kind: 'parameter-homotopy', expected: DEGREE, prepare: async () => problem } } as unknown as ProblemDefinition;
const target = Float64Array.of(-1, 0.5);
const plain = (value: unknown) => JSON.stringify(value, (k, v) => (k === 'seconds' ? undefined : v instanceof Float64Array ? Array.from(v) : v));

describe('the production engine with and without workers', () => {
  const engine = loadEngine();
  afterAll(async () => (await engine).close?.());

  it('solves a parameter homotopy to the same report on the worker pool as on this thread (64 roots)', async () => {
    const strategy = (await engine).strategies['parameter-homotopy']!;
    const here = await strategy.solve(shown, target, { seed: 7 }, definition);
    const pooled = await strategy.solve(shown, target, { seed: 7, workers: 2 }, definition);
    expect(here.solutions).toHaveLength(DEGREE);
    expect(plain(pooled)).toBe(plain(here));
  });

  it('certifies to the same verdict with two workers as with one thread (64 roots, all certified distinct)', async () => {
    const e = await engine;
    const points = (await e.strategies['parameter-homotopy']!.solve(shown, target, { seed: 7 }, definition)).solutions.map((s) => s.point);
    const one = await e.certify(shown, target, points, { realParameters: false });
    const two = await e.certify(shown, target, points, { realParameters: false, workers: 2 });
    expect(one.certifiedDistinct).toBe(DEGREE);
    expect(JSON.parse(plain(two))).toEqual(JSON.parse(plain(one))); // the same fields and numbers, in any key order
  });
});

describe('the production engine’s monodromy group for a problem solved from a stored set', () => {
  const engine = loadEngine();
  afterAll(async () => (await engine).close?.());

  // The monodromy group of x⁶⁴ = p is cyclic of order 64: a loop around p = 0 turns the roots by one step (common
  // practice, no source). The loops start at the stored set (p = 1) with the family's module, on this thread and
  // on two workers, and must give the same group as loops walked at the solved instance.
  it.each([[undefined], [2]])('walks its loops on the stored set (workers: %s) and finds the cyclic group of order 64', async (workers) => {
    const e = await engine;
    const points = (await e.strategies['parameter-homotopy']!.solve(shown, target, { seed: 7 }, definition)).solutions.map((s) => s.point);
    const group = await e.group!(shown, target, points, workers === undefined ? { seed: 5, definition } : { seed: 5, workers, definition });
    expect(group).toMatchObject({ degree: DEGREE, order: '64', transitive: true, verdict: 'order' });
    const atInstance = await e.group!(shown, target, points, { seed: 5 });
    expect(atInstance.order).toBe('64');
  });
});
