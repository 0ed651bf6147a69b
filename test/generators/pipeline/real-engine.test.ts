import { describe, expect, it } from 'vitest';
import { loadEngine } from '../../../generators/pipeline/real-engine.ts';
import { problems } from '../../../generators/problems/index.ts';
import { ENGINE_VERSION } from '../../../src/engine/version.ts';

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
