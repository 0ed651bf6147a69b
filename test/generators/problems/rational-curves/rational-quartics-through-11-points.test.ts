import { describe, expect, it } from 'vitest';
import quartics from '../../../../generators/problems/rational-curves/rational-quartics-through-11-points.ts';
import { affineMapPoint } from '../../../../generators/problems/rational-curves/parametrised-map.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { createRandom, randomParameterPoint, solveByParameterHomotopy, type ParameterProblem } from '../../../../src/engine/index.ts';

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
    // Regular ends: below the maps' singular threshold (1e15, map-store.ts; the working chart's condition) and solving.
    expect(Math.max(...report.solutions.map((s) => s.condition))).toBeLessThan(1e15);
    expect(Math.max(...report.solutions.map((s) => s.residual))).toBeLessThan(1e-10);
    expect(closestPair(probeImages(report.solutions, target))).toBeGreaterThan(1e-8);
    // The naive counts read off the shown system's degrees: 5^16 (computed, common practice, no source).
    expect(report.bezoutBound).toBe(5 ** 16);
  }, 120_000);
});
