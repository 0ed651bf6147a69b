import { describe, expect, it } from 'vitest';
import definition, { clebschFrame } from '../../../../generators/problems/surfaces/lines-on-a-cubic-surface.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { drawnRealSolutions, demoInstance, randomInstance, seeds, solveInstance, splitSeeds, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);
const demo = definition.instances.find((i) => i.kind === 'demo')!;
const params = paramsFrom(system.parameters, demo.parameters as Record<string, number>);

/** The five linear forms x₀ … x₄ (x₄ = −Σ) of Clebsch's surface in the demo frame, as rows (x, y, z, 1). */
const forms = [...clebschFrame, clebschFrame.reduce((s, r) => s.map((v, i) => v - r[i]!), [0, 0, 0, 0])];

/** (a, b, c, d) of the line where the two planes n₁·(x, y, z, 1) = 0 and n₂·(x, y, z, 1) = 0 meet. */
function lineChart(n1: readonly number[], n2: readonly number[]): number[] {
  const det = n1[0]! * n2[1]! - n1[1]! * n2[0]!;
  const a = (-n1[3]! * n2[1]! + n1[1]! * n2[3]!) / det;
  const b = (-n1[0]! * n2[3]! + n1[3]! * n2[0]!) / det;
  const dir = [n1[1]! * n2[2]! - n1[2]! * n2[1]!, n1[2]! * n2[0]! - n1[0]! * n2[2]!, n1[0]! * n2[1]! - n1[1]! * n2[0]!];
  return [a, b, dir[0]! / dir[2]!, dir[1]! / dir[2]!];
}

// Clebsch's diagonal surface contains the 15 lines xᵢ + xⱼ = xₖ + xₗ = 0 (the fifth coordinate then vanishes);
// classical (Clebsch 1871, from memory). The other 12 lines are defined over Q(√5) and are left to the solver.
const rationalLines: [number, number, number, number][] = [];
for (let m = 0; m < 5; m++) {
  const rest = [0, 1, 2, 3, 4].filter((i) => i !== m) as [number, number, number, number];
  for (const [i, j, k, l] of [[rest[0], rest[1], rest[2], rest[3]], [rest[0], rest[2], rest[1], rest[3]], [rest[0], rest[3], rest[1], rest[2]]] as [number, number, number, number][]) rationalLines.push([i, j, k, l]);
}

describe('lines on a cubic surface: the formulation', () => {
  it.each(rationalLines)('the demo surface contains the line x%i + x%i = x%i + x%i = 0', (i, j, k, l) => {
    const plane = (p: number, q: number) => forms[p]!.map((v, t) => v + forms[q]![t]!);
    const chart = lineChart(plane(i, j), plane(k, l));
    expect(largestResidual(system.equations, real(chart), params)).toBeLessThan(1e-7);
  });

  it.each([[0, 1, 2, 3], [0, 2, 1, 3], [0, 3, 1, 2]])('the Fermat model contains the real line x%i + x%i = x%i + x%i = 0', (i, j, k, l) => {
    const fermat = paramsFrom(system.parameters, demoInstance(definition, 'fermat-model').parameters as Record<string, number>);
    const plane = (p: number, q: number) => clebschFrame[p]!.map((v, t) => v + clebschFrame[q]![t]!);
    expect(largestResidual(system.equations, real(lineChart(plane(i!, j!), plane(k!, l!))), fermat)).toBeLessThan(1e-7);
  });

  it('a line off the surface does not satisfy the equations', () => {
    expect(largestResidual(system.equations, real([0.1, 0.2, 0.3, 0.4]), params)).toBeGreaterThan(1e-3);
  });

  it.each([
    ['the diagonal through the origin', [0, 0, 1, 1], [[-4, -4, -4], [4, 4, 4]]],
    ['a line crossing z = 0 at (1, 2) along (0.5, −0.25, 1)', [1, 2, 0.5, -0.25], [[-1, 3, -4], [3, 1, 4]]],
  ] as const)('draws %s as a stick cut at the faces of the cube [−4, 4]³', (_, chart, ends) => {
    const items = definition.drawing!.solution(chart, {});
    expect(items).toHaveLength(1);
    const stick = items[0]!;
    if (stick.shape !== 'stick') throw new Error(`expected a stick, got ${stick.shape}`);
    [stick.from, stick.to].forEach((p, i) => p.forEach((v, k) => expect(v).toBeCloseTo(ends[i]![k]!, 12)));
  });

  it('draws nothing for a line that misses the cube', () => {
    expect(definition.drawing!.solution([30, 0, 0, 0], {})).toEqual([]);
  });
});

// 27 lines on a smooth cubic surface (Cayley 1849; Salmon 1849); the 54 surplus paths of the chart's Bézout
// bound 81 go to infinity (our own derivation, see the definition's excess note).
describe('solving lines on a cubic surface', () => {
  const check = async (seed: number) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.solutions).toHaveLength(27);
    expect(report.stats).toMatchObject({ tracked: 81, regular: 27, singular: 0, atInfinity: 54, failed: 0 });
  };
  const title = 'random complex surface %i: 27 lines, 54 paths at infinity, none failed';
  // No seed currently needs an engine-issue exception (seed 19 did before the engine re-judged singular ends).
  const { checked, skipped } = splitSeeds(seeds(20), []);
  it.each(checked)(title, check);
  it.skip.each(skipped)(`${title} (engine issue)`, check);

  it.each(seeds(5))('random complex surface %i, two-homogeneous start: 27 lines of 45 paths, the other 18 at infinity', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed), 'multihomogeneous');
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.multihomogeneousBound).toBe(45);
    expect(report.solutions).toHaveLength(27);
    expect(report.stats).toMatchObject({ tracked: 45, regular: 27, singular: 0, atInfinity: 18, failed: 0 });
  });

  it('the plaster model (a tilted Clebsch diagonal surface): 27 lines, all real (Clebsch 1871)', async () => {
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(27);
    expect(solved.real).toBe(27);
    // Every real line crosses the cube the figure draws.
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.filter((i) => i.shape === 'stick').length)).toEqual(new Array(27).fill(1));
  });

  it('the Fermat model: 27 lines, exactly 3 real (the least possible, Schläfli 1863)', async () => {
    const { report, real } = await solveInstance(definition, demoInstance(definition, 'fermat-model'));
    expect(report.solutions).toHaveLength(27);
    expect(real).toBe(3);
  });
});
