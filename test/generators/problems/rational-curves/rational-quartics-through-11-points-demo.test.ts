import { describe, expect, it } from 'vitest';
import quartics from '../../../../generators/problems/rational-curves/rational-quartics-through-11-points.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../../src/atlas/parameters-of.ts';
import { isRealPoint, solveByParameterHomotopy } from '../../../../src/engine/index.ts';
import { figureItemSchema } from '../../../../src/atlas/figure.ts';
import { demoInstance } from '../shared/solve.ts';

// The page's demo, kept apart from the generic checks so that each file stays well under a minute.
const shown = systemOf(quartics);

describe('rational quartics through 11 points: the demo', () => {
  it('the drone waypoints: at least 240 of the 620 quartics are real, each drawn as polylines', async () => {
    // At least |W_4| = 240 real rational quartics pass through 11 general real points: Welschinger's invariant
    // (Welschinger, Invent. Math. 162 (2005); W_4 = 240 computed by Itenberg–Kharlamov–Shustin, 2003; from memory).
    const instance = demoInstance(quartics, 'drone-waypoints');
    const target = parametersOf(quartics, instance);
    const solver = quartics.solver;
    if (solver?.kind !== 'parameter-homotopy') throw new Error('the quartic page must use the parameter homotopy');
    const report = await solveByParameterHomotopy(await solver.prepare(shown), target, { seed: instance.seed });
    expect(report.solutions).toHaveLength(620);
    const real = report.solutions.filter((s) => isRealPoint(s.point));
    expect(real.length).toBeGreaterThanOrEqual(240);
    const q = Object.fromEntries(shown.parameters.map((name, j) => [name, target[2 * j]!]));
    real.slice(0, 20).forEach((s) => {
      const items = quartics.drawing!.solution(Array.from(s.point).filter((_, k) => k % 2 === 0), q);
      expect(items.length).toBeGreaterThan(0);
      items.forEach((item) => expect(figureItemSchema.safeParse(item).success).toBe(true));
    });
  }, 120_000);
});
