import { afterAll, describe, expect, it } from 'vitest';
import type { PathEnd } from '../../../src/engine/homotopy.ts';
import type { PolynomialSystem } from '../../../src/engine/expr/node.ts';
import { add, mul, param, pow, sub, unknown } from '../../../src/engine/expr/build.ts';
import { collectSolutions, solveSystem, type SolveReport } from '../../../src/engine/solve/solve-system.ts';
import { closeSharedPool } from '../../../src/engine/pool/shared-pool.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { linesOnCubic, randomSystem } from '../../../generators/bench/engine-systems.ts';

// Common practice, no source: a recorded seed must reproduce a run byte for byte (DESIGN.md, "Regeneration").
const bytes = (r: SolveReport): string => JSON.stringify({ ...r, seconds: 0 }, (_, v) => (v instanceof Float64Array ? Array.from(v) : v));

afterAll(() => closeSharedPool());

describe('determinism', () => {
  const system = linesOnCubic(createRandom(21));

  it('the same seed gives identical bytes', async () => {
    const a = await solveSystem(system, new Float64Array(0), { seed: 5 });
    const b = await solveSystem(system, new Float64Array(0), { seed: 5 });
    expect(bytes(a)).toBe(bytes(b));
    // Cayley 1849, Salmon 1849: 27 lines on a smooth cubic surface
    expect(a.solutions).toHaveLength(27);
  });

  it('a different seed tracks other paths but finds the same 27 lines', async () => {
    const a = await solveSystem(system, new Float64Array(0), { seed: 5 });
    const c = await solveSystem(system, new Float64Array(0), { seed: 6 });
    expect(bytes(a)).not.toBe(bytes(c));
    expect(c.solutions).toHaveLength(27);
    c.solutions.forEach((s, i) => {
      for (let k = 0; k < s.point.length; k++) expect(s.point[k]).toBeCloseTo(a.solutions[i]!.point[k]!, 8);
    });
  });

  it.each([2, 3, 5])('%i shards merged (ends concatenated in path order) equal one run', async (count) => {
    const whole = await solveSystem(system, new Float64Array(0), { seed: 5 });
    const ends: PathEnd[] = [];
    for (let index = 0; index < count; index++) {
      const part = await solveSystem(system, new Float64Array(0), { seed: 5, shard: { index, count } });
      ends.push(...part.ends);
    }
    const merged = collectSolutions(system, new Float64Array(0), ends, whole);
    expect(bytes(merged)).toBe(bytes(whole));
  });

  it('a shard reports global path indices', async () => {
    const part = await solveSystem(system, new Float64Array(0), { seed: 5, shard: { index: 1, count: 3 } });
    expect(part.ends).toHaveLength(27);
    expect(part.solutions.flatMap((s) => s.paths).every((p) => p >= 27 && p < 54)).toBe(true);
  });

  it('the worker pool gives the same report as in-process tracking, and stays reusable', async () => {
    const cubics = randomSystem(createRandom(4), 2, 3);
    const local = await solveSystem(system, new Float64Array(0), { seed: 5 });
    const pooled = await solveSystem(system, new Float64Array(0), { seed: 5, workers: 2 });
    expect(bytes(pooled)).toBe(bytes(local));
    const again = await solveSystem(cubics, new Float64Array(0), { seed: 9, workers: 2 });
    expect(bytes(again)).toBe(bytes(await solveSystem(cubics, new Float64Array(0), { seed: 9 })));
  });

  it('the pool solves instances of one structure with their own parameter values (no stale cached homotopy)', async () => {
    const x = unknown('x', 0), y = unknown('y', 1);
    const conics: PolynomialSystem = {
      unknowns: ['x', 'y'],
      parameters: ['a', 'b'],
      equations: [sub(add(pow(x, 2), pow(y, 2)), param('a', 0)), sub(mul(x, y), param('b', 1))],
    };
    for (const [a, b] of [[5, 2], [10, 3]] as const) {
      const p = new Float64Array([a, 0, b, 0]);
      const pooled = await solveSystem(conics, p, { seed: 3, workers: 2 });
      expect(bytes(pooled)).toBe(bytes(await solveSystem(conics, p, { seed: 3 })));
      // hand arithmetic: x² + y² = a, xy = b has the 4 points with x² = (a ± √(a² − 4b²))/2
      for (const s of pooled.solutions) expect(s.residual).toBeLessThan(1e-14);
      expect(pooled.solutions).toHaveLength(4);
    }
  });

  it('reports progress up to the number of paths', async () => {
    const seen: number[] = [];
    await solveSystem(randomSystem(createRandom(4), 2, 2), new Float64Array(0), { seed: 1, onProgress: (done, total) => { seen.push(done); expect(total).toBe(4); } });
    expect(seen[seen.length - 1]).toBe(4);
  });
});
