import { describe, expect, it } from 'vitest';
import * as engine from '../../../src/engine/index.ts';
import { parametersOf } from '../../../src/atlas/parameters-of.ts';
import { explorationSchema } from '../../../src/atlas/exploration.ts';
import { loadTarget } from '../../../generators/pipeline/registry.ts';
import { exploreRealCounts } from '../../../generators/explore/explore-real-counts.ts';
import { certifiedRealCount } from '../../../generators/explore/certified-real-count.ts';

async function explore(slug: string, samples: number, climbSteps: number, seed: number) {
  const loaded = await loadTarget(slug);
  const generic = loaded.definition.instances.find((i) => i.kind === 'generic')!;
  const parameters = parametersOf(loaded.definition, generic);
  const report = await engine.solveSystem(loaded.system, parameters, { seed: generic.seed, start: 'total-degree' });
  return exploreRealCounts(engine, loaded, { samples, climbSteps, seed, engineVersion: engine.ENGINE_VERSION, generic: { parameters, solutions: report.solutions.map((s) => s.point) } });
}

// Real solutions of a real system come in complex-conjugate pairs, so the real count has the parity of the total
// (common practice, no source needed): two real conics meet in 0, 2 or 4 real points; a real cubic surface carries
// 27, 15, 7 or 3 real lines (L. Schläfli, Phil. Trans. R. Soc. London 153, 1863).
describe('the real-solution explorer', () => {
  it.each([
    ['points-common-to-two-conics', [0, 2, 4]],
    ['lines-on-a-cubic-surface', [3, 7, 15, 27]],
  ] as const)('%s: every certified real count is one the theory allows', async (slug, allowed) => {
    const e = await explore(slug, 12, 4, 3);
    expect(explorationSchema.parse(e)).toBeTruthy();
    expect(e.distribution.reduce((s, d) => s + d.samples, 0)).toBe(e.samples - e.incompleteSamples);
    for (const d of e.distribution) expect(allowed).toContain(d.real);
    expect(allowed).toContain(e.best.real);
    expect(e.best.real).toBe(Math.max(...e.distribution.map((d) => d.real), ...e.climb.map((c) => c.real)));
  }, 120_000);

  it('gives the same exploration for the same seed', async () => {
    const a = await explore('points-common-to-two-conics', 6, 3, 9);
    const b = await explore('points-common-to-two-conics', 6, 3, 9);
    expect(b).toEqual(a);
  }, 60_000);
});

describe('certified real count of a carried set', () => {
  const stub = (certifiedDistinct: number, certifiedReal: number) => ({ certify: () => ({ certifiedDistinct, certifiedReal }) }) as unknown as engine.Certifier;
  const x = new Float64Array(2);
  it.each([
    ['every route arrived and every solution is certified distinct', [x, x], stub(2, 2), 2],
    ['a route failed', [x, null], stub(2, 2), null],
    ['a solution was not certified distinct', [x, x], stub(1, 1), null],
  ] as const)('%s', (_, points, certifier, expected) => {
    expect(certifiedRealCount(certifier, new Float64Array(2), { points, failedPaths: 0, unresolvedJumps: 0, paths: 0, routes: 1 })).toBe(expected);
  });
});
