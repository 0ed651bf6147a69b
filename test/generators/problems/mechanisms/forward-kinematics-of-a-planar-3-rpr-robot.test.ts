import { describe, expect, it } from 'vitest';
import definition, { placedJoints } from '../../../../generators/problems/mechanisms/forward-kinematics-of-a-planar-3-rpr-robot.ts';
import { signChangesAlong } from '../shared/sign-changes.ts';
import { drawnRealSolutions, demoInstance, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const demo = demoInstance(definition, 'positioning-table');
const p = demo.parameters as Record<string, number>;
const anchors = [[0, 0], [p.a2!, 0], [p.a3x!, p.a3y!]] as const;
const lengths = [p.r1!, p.r2!, p.r3!];

/**
 * Reference, independent of the homotopy: the classical one-dimensional scan. For each angle θ, joint B₁ lies on
 * the circle of radius ρ₁ about A₁ and, since B₂ = B₁ + R(θ)B₂', on the circle of radius ρ₂ about A₂ − R(θ)B₂';
 * on each of the two branches of their intersection, strut 3's error |B₃ − A₃|² − ρ₃² is a function of θ, and its
 * sign changes over a fine grid count the real assembly modes.
 */
function realModesByScan(steps = 200000): number {
  const branchError = (theta: number, branch: number): number | null => {
    const c = Math.cos(theta), s = Math.sin(theta);
    const q = [p.a2! - c * p.b2!, -s * p.b2!];
    const d = Math.hypot(q[0]!, q[1]!);
    const along = (d * d + lengths[0]! ** 2 - lengths[1]! ** 2) / (2 * d);
    const h2 = lengths[0]! ** 2 - along * along;
    if (h2 < 0) return null;
    const h = branch * Math.sqrt(h2);
    const x = (along * q[0]! - h * q[1]!) / d, y = (along * q[1]! + h * q[0]!) / d;
    const b3 = placedJoints([x, y, c, s], p)[2]!;
    return (b3[0] - anchors[2][0]) ** 2 + (b3[1] - anchors[2][1]) ** 2 - lengths[2]! ** 2;
  };
  return [1, -1].reduce((sum, branch) => sum + signChangesAlong((theta) => branchError(theta, branch), 0, 2 * Math.PI, steps), 0);
}

describe('planar 3-RPR robot: the formulation', () => {
  it('the scan finds six real assembly modes for the demo table', () => {
    expect(realModesByScan()).toBe(6);
  });

  it('places the plate joints by the pose: B₁ at (x, y), B₂ at distance b₂ from it', () => {
    const [b1, b2] = placedJoints([1, 2, Math.cos(0.3), Math.sin(0.3)], p);
    expect(b1).toEqual([1, 2]);
    expect(Math.hypot(b2![0] - 1, b2![1] - 2)).toBeCloseTo(p.b2!, 12);
  });
});

// 6 assembly modes of a general planar 3-RPR robot: a degree-6 polynomial (Gosselin–Merlet 1994, Mech. Mach. Theory 29,
// and the earlier papers they name; Hunt 1983 from memory). The 10 surplus total-degree paths go to infinity and the
// 2-homogeneous bound is 8 (our own derivation, see the definition's excess note).
describe('solving the planar 3-RPR robot', () => {
  it.each(seeds(10))('random complex robot %i: 6 assembly modes, 10 paths at infinity, none failed', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.bezoutBound).toBe(16);
    expect(report.solutions).toHaveLength(6);
    expect(report.stats).toMatchObject({ tracked: 16, regular: 6, singular: 0, atInfinity: 10, failed: 0 });
  });

  it.each(seeds(5))('random complex robot %i, two-homogeneous start: 6 of 8 paths, the other 2 at infinity', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed), 'multihomogeneous');
    expect(report.multihomogeneousBound).toBe(8);
    expect(report.solutions).toHaveLength(6);
    expect(report.stats).toMatchObject({ tracked: 8, regular: 6, atInfinity: 2, failed: 0 });
  });

  it('the positioning table: 6 poses, all real, each with the three strut lengths', async () => {
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(6);
    expect(solved.real).toBe(6);
    for (const s of solved.report.solutions) {
      const placed = placedJoints([0, 2, 4, 6].map((i) => s.point[i]!), p);
      placed.forEach((b, i) => expect(Math.hypot(b[0] - anchors[i]![0], b[1] - anchors[i]![1])).toBeCloseTo(lengths[i]!, 9));
    }
    const drawn = drawnRealSolutions(definition, demo, solved);
    expect(drawn.map((items) => items.filter((i) => i.layer === 'struts').length)).toEqual(new Array(6).fill(3));
  });
});
