import { describe, expect, it } from 'vitest';
import definition, { demoPostureAngles, demoToolFrame } from '../../../../generators/problems/mechanisms/inverse-kinematics-of-a-6r-serial-arm.ts';
import { framesOf, type Frame } from '../../../../generators/problems/mechanisms/denavit-hartenberg.ts';
import { armOf, axesOf, jointAnglesOf, skeletonOf } from '../../../../generators/problems/mechanisms/serial-arm-skeleton.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../../src/atlas/parameters-of.ts';
import { naturalUnits } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { drawnRealSolutions, demoInstance, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';
import type { Vector3 } from '../../../../generators/problems/mechanisms/vector3.ts';

const system = systemOf(definition);
const demo = demoInstance(definition, 'glazing-cell');
const p = demo.parameters as Record<string, number>;
const arm = armOf(p);
const toolAxis: Vector3 = [p.wx!, p.wy!, p.wz!];

/** The stored unknowns (c₁, s₁, z₃, z₄, z₅) of the posture with the given joint angles (radians). */
function unknownsOf(frames: readonly Frame[], theta1: number): number[] {
  return [Math.cos(theta1), Math.sin(theta1), ...frames[2]!.z, ...frames[3]!.z, ...frames[4]!.z];
}

const far = (a: Vector3, b: Vector3) => Math.max(...a.map((v, k) => Math.abs(v - b[k]!)));

describe('6R arm: the formulation', () => {
  const angles = [0.3, -1.1, 2.0, 0.7, -0.4, 1.9];
  const frames = framesOf(arm, angles.map((t) => [Math.cos(t), Math.sin(t)] as [number, number]));
  const tool = frames[6]!;
  const pose = { px: tool.origin[0], py: tool.origin[1], pz: tool.origin[2], wx: tool.z[0], wy: tool.z[1], wz: tool.z[2] };

  it('a posture satisfies the eleven equations at the pose its forward kinematics gives', () => {
    expect(largestResidual(system.equations, real(unknownsOf(frames, angles[0]!)), paramsFrom(system.parameters, { ...p, ...pose }))).toBeLessThan(1e-12);
  });

  it('the same posture does not reach a tool point 1 cm away', () => {
    const moved = paramsFrom(system.parameters, { ...p, ...pose, px: pose.px + 0.01 });
    expect(largestResidual(system.equations, real(unknownsOf(frames, angles[0]!)), moved)).toBeGreaterThan(1e-4);
  });

  it('the skeleton ends at the tool point and the joint angles are recovered from the axes', () => {
    const axes = axesOf(unknownsOf(frames, angles[0]!), arm, tool.z);
    expect(far(skeletonOf(axes, arm).at(-1)!, tool.origin)).toBeLessThan(1e-12);
    jointAnglesOf(axes, arm, tool.x).forEach(([c, s], i) => {
      expect(c).toBeCloseTo(Math.cos(angles[i]!), 12);
      expect(s).toBeCloseTo(Math.sin(angles[i]!), 12);
    });
  });
});

// 16 postures of a general 6R arm at a general pose (Raghavan–Roth 1993, J. Mech. Des. 115, a degree-16 polynomial;
// Tsai–Morgan 1985 found the 16 by continuation). The 1024 − 16 = 1008 surplus paths must end at infinity, where each
// block (c₁, s₁), z₃, z₄, z₅ of the direction is negligible or isotropic (our own derivation, see the excess note).
describe('solving the 6R arm', () => {
  it.each(seeds(3))('random complex arm and pose %i: 16 postures, 1008 paths at infinity on the isotropic cones', async (seed) => {
    const instance = randomInstance(seed);
    const { report } = await solveInstance(definition, instance);
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.bezoutBound).toBe(1024);
    expect(report.solutions).toHaveLength(16);
    expect(report.stats).toMatchObject({ tracked: 1024, regular: 16, singular: 0, excess: 0, atInfinity: 1008, failed: 0 });
    const units = naturalUnits(system, parametersOf(definition, instance)).variables.map((c) => 2 ** c);
    const blocks = [[0, 1], [2, 3, 4], [5, 6, 7], [8, 9, 10]];
    for (const end of report.ends.filter((e) => e.outcome === 'at-infinity')) {
      const z = Array.from({ length: 11 }, (_, k) => [end.point[2 * k]! * units[k]!, end.point[2 * k + 1]! * units[k]!] as const);
      const top = Math.max(...z.map((v) => Math.hypot(...v)));
      for (const block of blocks) {
        const size = Math.max(...block.map((k) => Math.hypot(...z[k]!))) / top;
        if (size < 0.05) continue;
        const square = block.reduce<[number, number]>((s, k) => [s[0] + z[k]![0] ** 2 - z[k]![1] ** 2, s[1] + 2 * z[k]![0] * z[k]![1]], [0, 0]);
        expect(Math.hypot(...square) / (size * top) ** 2).toBeLessThan(1e-3);
      }
    }
  });

  it('the glazing cell: its target pose is the forward kinematics of a posture of our own', () => {
    const tool = framesOf(arm, demoPostureAngles.map((t) => [Math.cos(t), Math.sin(t)] as [number, number]))[6]!;
    expect(far(tool.origin, [p.px!, p.py!, p.pz!])).toBeLessThan(1e-15);
    expect(far(tool.z, toolAxis)).toBeLessThan(1e-15);
  });

  it('the glazing cell: 16 postures, the real ones each reproducing the tool pose by forward kinematics', async () => {
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(16);
    expect(solved.real).toBe(16);
    // The tool's x-axis is not a parameter of the system (it fixes only θ₆); it comes from the posture the pose was made from.
    const toolX = demoToolFrame.x;
    const drawn = drawnRealSolutions(definition, demo, solved);
    expect(drawn.map((items) => items.filter((i) => i.layer === 'joints').length)).toEqual(new Array(16).fill(6));
    for (const s of solved.report.solutions) {
      const values = Array.from(s.point);
      if (values.some((v, k) => k % 2 === 1 && Math.abs(v) > 1e-7)) continue;
      const angles = jointAnglesOf(axesOf(values.filter((_, k) => k % 2 === 0), arm, toolAxis), arm, toolX);
      angles.forEach(([c, sn]) => expect(Math.hypot(c, sn)).toBeCloseTo(1, 9));
      const tool = framesOf(arm, angles)[6]!;
      expect(far(tool.origin, [p.px!, p.py!, p.pz!])).toBeLessThan(1e-9);
      expect(far(tool.z, toolAxis)).toBeLessThan(1e-9);
      expect(far(tool.x, toolX)).toBeLessThan(1e-9);
    }
  });
});
