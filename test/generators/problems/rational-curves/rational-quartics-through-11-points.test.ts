import { describe, expect, it } from 'vitest';
import quartics from '../../../../generators/problems/rational-curves/rational-quartics-through-11-points.ts';
import { affineMapPoint } from '../../../../generators/problems/rational-curves/parametrised-map.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../../src/atlas/parameters-of.ts';
import { createRandom, isRealPoint, randomParameterPoint, solveByParameterHomotopy, type ParameterProblem } from '../../../../src/engine/index.ts';
import { figureItemSchema } from '../../../../src/atlas/figure.ts';
import { demoInstance } from '../shared/solve.ts';

const shown = systemOf(quartics);
let problem: ParameterProblem | undefined;
async function prepared(): Promise<ParameterProblem> {
  const solver = quartics.solver;
  if (solver?.kind !== 'parameter-homotopy') throw new Error('the quartic page must use the parameter homotopy');
  problem ??= await solver.prepare(shown);
  return problem;
}

/** The images of t = 0.37 + 0.21i under every solution's map: distinct maps of distinct curves give distinct points. */
function probeImages(solutions: readonly { point: Float64Array }[], parameters: Float64Array): number[][] {
  return solutions.map((s) => affineMapPoint(4, s.point, parameters, [0.37, 0.21]).flat());
}

function closestPair(points: readonly number[][]): number {
  let best = Infinity;
  points.forEach((a, i) => points.slice(i + 1).forEach((b) => (best = Math.min(best, Math.hypot(...a.map((v, k) => v - b[k]!)) / (1 + Math.hypot(...a))))));
  return best;
}

// 620 rational plane quartics pass through 11 general points: N_4 = 620 (Kontsevich–Manin, Gromov–Witten classes,
// quantum cohomology, and enumerative geometry, Comm. Math. Phys. 164 (1994) 525–562).
describe('rational quartics through 11 points', () => {
  it.each([1, 2])('random complex instance %i: 620 distinct nonsingular maps, no failed path, 620 distinct curves', async (seed) => {
    const target = randomParameterPoint(shown.parameters.length, createRandom(seed));
    const report = await solveByParameterHomotopy(await prepared(), target, { seed });
    expect(report.stats.failed).toBe(0);
    expect(report.solutions).toHaveLength(620);
    expect(report.solutions.every((s) => s.condition < 1e13 && s.residual < 1e-10)).toBe(true);
    expect(closestPair(probeImages(report.solutions, target))).toBeGreaterThan(1e-8);
    // The naive counts read off the shown system's degrees: 5^16 (computed, common practice, no source).
    expect(report.bezoutBound).toBe(5 ** 16);
  }, 120_000);

  it('the drone waypoints: at least 240 of the 620 quartics are real, each drawn as polylines', async () => {
    // At least |W_4| = 240 real rational quartics pass through 11 general real points: Welschinger's invariant
    // (Welschinger, Invent. Math. 162 (2005); W_4 = 240 computed by Itenberg–Kharlamov–Shustin, 2003; from memory).
    const instance = demoInstance(quartics, 'drone-waypoints');
    const target = parametersOf(quartics, instance);
    const report = await solveByParameterHomotopy(await prepared(), target, { seed: instance.seed });
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
