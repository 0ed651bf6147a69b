import { describe, expect, it } from 'vitest';
import definition, { markersInCameraFrame } from '../../../../generators/problems/mechanisms/perspective-three-point-pose.ts';
import type { ProblemDefinition } from '../../../../src/atlas/definition.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { createRandom, solveSystem } from '../../../../src/engine/index.ts';
import { signChangesAlong } from '../shared/sign-changes.ts';
import { drawnRealSolutions, demoInstance, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const demo = demoInstance(definition, 'marker-posts');
const p = demo.parameters as Record<string, number>;
const ray = (i: number) => [p[`x${i}`]!, p[`y${i}`]!, 1];
const dot = (a: number[], b: number[]) => a[0]! * b[0]! + a[1]! * b[1]! + a[2]! * b[2]!;
const q = (i: number, j: number) => dot(ray(i), ray(j));
const side12 = (u: number) => q(1, 1) - 2 * u * q(1, 2) + u * u * q(2, 2);

/**
 * Reference, independent of the homotopy: a scan over the depth ratio u > 0. The second conic is a quadratic in v,
 * solved in closed form on its two branches; the sign changes of the first conic along each branch count the real
 * poses in front of the camera (u, v > 0).
 */
function posesInFrontByScan(steps = 100000, uMax = 40): number {
  const error = (u: number, branch: number): number | null => {
    const c = q(1, 1) - (p.d13! / p.d12!) * side12(u);
    const disc = q(1, 3) ** 2 - q(3, 3) * c;
    if (disc < 0) return null;
    const v = (q(1, 3) + branch * Math.sqrt(disc)) / q(3, 3);
    if (v <= 0) return null;
    return p.d12! * (u * u * q(2, 2) - 2 * u * v * q(2, 3) + v * v * q(3, 3)) - p.d23! * side12(u);
  };
  return [1, -1].reduce((sum, branch) => sum + signChangesAlong((u) => error(u, branch), uMax / steps, uMax, steps), 0);
}

/** The naive depth system: λᵢ²qᵢᵢ − 2λᵢλⱼqᵢⱼ + λⱼ²qⱼⱼ = dᵢⱼ for the three pairs, with q from the image points. */
const depthDefinition: ProblemDefinition = {
  ...definition,
  slug: 'perspective-three-point-depths',
  formulation: {
    unknowns: ['l1', 'l2', 'l3'],
    parameters: definition.formulation.parameters,
    description: 'The depths of the three markers along their rays.',
    equations: (u, P, ops) => {
      const l = [u.l1!, u.l2!, u.l3!];
      const qq = (i: number, j: number) => ops.add(ops.mul(P[`x${i}`]!, P[`x${j}`]!), ops.mul(P[`y${i}`]!, P[`y${j}`]!), 1);
      const pair = (i: number, j: number) => ops.sub(ops.add(ops.mul(ops.pow(l[i - 1]!, 2), qq(i, i)), ops.mul(-2, l[i - 1]!, l[j - 1]!, qq(i, j)), ops.mul(ops.pow(l[j - 1]!, 2), qq(j, j))), P[`d${i}${j}`]!);
      return [pair(1, 2), pair(1, 3), pair(2, 3)];
    },
  },
};

describe('perspective-three-point: the formulation', () => {
  it('the scan finds four poses in front of the camera for the demo view', () => {
    expect(posesInFrontByScan()).toBe(4);
  });

  it('places marker 1 at the distance √d₁₂ from marker 2 on their rays', () => {
    const [m1, m2] = markersInCameraFrame([1.3, 0.7], p);
    expect(Math.hypot(m1![0] - m2![0], m1![1] - m2![1], m1![2] - m2![2])).toBeCloseTo(Math.sqrt(p.d12!), 12);
  });

  // Our own derivation (see the excess note): in the depths the Bézout bound 8 is attained and the solutions come in
  // pairs ±(λ₁, λ₂, λ₃), one pair per solution of the ratio conics.
  it.each(seeds(3))('the naive depth system of random view %i has 8 solutions in 4 sign pairs', async (seed) => {
    const random = createRandom(seed);
    const parameters = new Float64Array(18);
    for (let j = 0; j < 9; j++) random.gaussianComplex(parameters, 2 * j);
    const report = await solveSystem(systemOf(depthDefinition), parameters, { seed, start: 'total-degree' });
    expect(report.solutions).toHaveLength(8);
    const points = report.solutions.map((s) => s.point);
    for (const x of points) {
      const negated = points.filter((y) => y.every((v, k) => Math.abs(v + x[k]!) < 1e-8 * (1 + Math.abs(v))));
      expect(negated).toHaveLength(1);
    }
  });
});

// At most 4 poses: Grunert 1841 and every direct solution reviewed by Haralick, Lee, Ottenberg, Nölle 1994
// (IJCV 13(3)) reduce P3P to a quartic; for general complex data all 4 occur.
describe('solving perspective-three-point', () => {
  it.each(seeds(10))('random complex view %i: 4 solutions, every path regular, none failed', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.bezoutBound).toBe(4);
    expect(report.solutions).toHaveLength(4);
    expect(report.stats).toMatchObject({ tracked: 4, regular: 4, atInfinity: 0, failed: 0 });
  });

  it('the marker posts: 4 poses, all real and in front of the camera, each with the taped spacings', async () => {
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(4);
    expect(solved.real).toBe(4);
    for (const s of solved.report.solutions) {
      const [u, v] = [s.point[0]!, s.point[2]!];
      expect(Math.min(u, v)).toBeGreaterThan(0);
      const [m1, m2, m3] = markersInCameraFrame([u, v], p);
      const gap = (a: number[], b: number[]) => Math.hypot(a[0]! - b[0]!, a[1]! - b[1]!, a[2]! - b[2]!);
      expect([gap(m1!, m2!) ** 2, gap(m1!, m3!) ** 2, gap(m2!, m3!) ** 2].map((d) => Number(d.toFixed(9)))).toEqual([p.d12, p.d13, p.d23]);
    }
    expect(drawnRealSolutions(definition, demo, solved).map((items) => items.filter((i) => i.shape === 'point').length)).toEqual([3, 3, 3, 3]);
  });
});
