import { describe, expect, it } from 'vitest';
import { solveSystem } from '../../../src/engine/solve/solve-system.ts';
import { planHomotopy, TRACK_FROM } from '../../../src/engine/start/plan.ts';
import { createHomotopy } from '../../../src/engine/homotopies/compiled-module.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { bitangents, linesOnCubic } from '../../../generators/bench/engine-systems.ts';
import { normInf } from '../../../src/engine/complex/packed.ts';

describe('multihomogeneous start systems (Morgan–Sommese, Appl. Math. Comput. 24, 1987)', () => {
  it('has as many start points as the two-homogeneous bound, each solving the start system (s = 1, where tracking starts)', () => {
    const system = linesOnCubic(createRandom(2));
    const plan = planHomotopy(system, new Float64Array(0), 3, 'multihomogeneous');
    expect(plan.count).toBe(45); // [derived] REFERENCES.md: two groups give 45
    const H = createHomotopy(plan.args);
    const N = plan.N, h = new Float64Array(2 * N), jac = new Float64Array(2 * N * N), ht = new Float64Array(2 * N);
    for (let k = 0; k < plan.count; k++) {
      const x = plan.starts.subarray(2 * N * k, 2 * N * (k + 1));
      H.evaluate(x, TRACK_FROM, 0, h, jac, ht);
      expect(normInf(h)).toBeLessThan(1e-12 * (1 + normInf(x)));
    }
  });

  it.each([11, 12])('finds the 27 lines on a cubic surface from 45 paths (Cayley 1849; Salmon 1849; seed %i)', async (seed) => {
    const r = await solveSystem(linesOnCubic(createRandom(seed)), new Float64Array(0), { seed, start: 'multihomogeneous' });
    expect(r.startSystem).toBe('multihomogeneous');
    expect(r.multihomogeneousBound).toBe(45);
    expect(r.bezoutBound).toBe(81);
    expect(r.stats.tracked).toBe(45);
    expect(r.stats.failed).toBe(0);
    expect(r.solutions).toHaveLength(27);
    expect(r.stats.regular + r.stats.singular + r.stats.atInfinity + r.stats.failed).toBe(r.stats.tracked);
  });

  it('finds the 28 bitangents of a quartic from 288 paths (Plücker 1834)', async () => {
    const r = await solveSystem(bitangents(createRandom(5)), new Float64Array(0), { seed: 5, start: 'multihomogeneous' });
    expect(r.stats.tracked).toBe(288);
    expect(r.stats.failed).toBe(0);
    expect(r.solutions).toHaveLength(28);
    expect(r.solutions.every((s) => s.residual < 1e-10)).toBe(true);
  });

  it('refuses a multihomogeneous start without groups', async () => {
    const { groups: _, ...plain } = linesOnCubic(createRandom(2));
    await expect(solveSystem(plain, new Float64Array(0), { seed: 1, start: 'multihomogeneous' })).rejects.toThrow(/needs variable groups/);
  });
});
