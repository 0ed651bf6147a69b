import { describe, expect, it } from 'vitest';
import { createInProcessLegTracker, createRandom, discoverByMonodromy, randomParameterPoint, solveByParameterHomotopy } from '../../../../src/engine/index.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { createHomotopy } from '../../../../generators/problems/conics/tangency-homotopy.ts';
import { randomChart, tangencySeed } from '../../../../generators/problems/conics/tangency-seed.ts';
import fiveConics from '../../../../generators/problems/conics/conics-tangent-to-5-conics.ts';

// Conics through p general points tangent to 5 − p general conics: 1, 6, 36, 184, 816, 3264 for p = 5, …, 0
// (Chasles, Comptes Rendus 1864; Bashelor–Ksir–Traves, Amer. Math. Monthly 115 (2008)). Monodromy is not told
// the count: it stops when a whole new parameter point adds no solution, and the count it reaches is checked.
describe.each([
  { points: 5, count: 1 },
  { points: 4, count: 6 },
  { points: 3, count: 36 },
  { points: 2, count: 184 },
  { points: 1, count: 816 },
])('conics through $points of 5 points, tangent to 5 − $points conics', ({ points, count }) => {
  it(`monodromy from one solution-first seed saturates at ${count} (Chasles 1864; Bashelor–Ksir–Traves 2008)`, async () => {
    const shape = { points, conics: 5 - points };
    const random = createRandom(40 + points);
    const chart = randomChart(shape, random);
    const seed = tangencySeed(shape, chart, random);
    const track = createInProcessLegTracker((leg) => createHomotopy({ ...shape, chart, ...leg }));
    const result = await discoverByMonodromy({ track, seed, random });
    expect(result.stop).toBe('saturated');
    expect(result.solutions).toHaveLength(count);
  });
});

describe('conics tangent to five conics', () => {
  it('the stored generic set carries to a new random complex instance: 3264 distinct nonsingular conics (Chasles 1864)', async () => {
    const solver = fiveConics.solver;
    if (solver?.kind !== 'parameter-homotopy') throw new Error('the five-conic problem must use the parameter homotopy');
    const problem = await solver.prepare(systemOf(fiveConics));
    const target = randomParameterPoint(30, createRandom(2026));
    const report = await solveByParameterHomotopy(problem, target, { seed: 5 });
    expect(report.stats.failed).toBe(0);
    expect(report.solutions).toHaveLength(3264);
    expect(report.solutions.every((s) => s.condition < 1e10)).toBe(true);
    // The naive count of the shown (sextic) formulation, read off its degrees: 6⁵ = 7776 (Steiner 1848).
    expect(report.bezoutBound).toBe(7776);
  });
});
