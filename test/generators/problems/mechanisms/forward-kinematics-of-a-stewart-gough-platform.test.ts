import { describe, expect, it } from 'vitest';
import definition, { placedPlatform } from '../../../../generators/problems/mechanisms/forward-kinematics-of-a-stewart-gough-platform.ts';
import { poseOfStudy } from '../../../../generators/problems/mechanisms/study-pose.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../../src/atlas/parameters-of.ts';
import { naturalUnits } from '../../../../src/engine/index.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { drawnRealSolutions, demoInstance, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);
const demo = demoInstance(definition, 'motion-rig');
const p = demo.parameters as Record<string, number>;
const joint = (side: 'a' | 'b', i: number) => ['x', 'y', 'z'].map((k) => p[`${side}${i}${k}`]!);

/** Study parameters (e₁, e₂, e₃, g₀, g₁, g₂, g₃) of the pose (t, e) with e₀ = 1: G = t·E/2, so g₀ = −t·e/2, g = (t + t × e)/2. */
function studyOf(t: readonly number[], e: readonly number[]): number[] {
  const cross = [t[1]! * e[2]! - t[2]! * e[1]!, t[2]! * e[0]! - t[0]! * e[2]!, t[0]! * e[1]! - t[1]! * e[0]!];
  return [...e, -(t[0]! * e[0]! + t[1]! * e[1]! + t[2]! * e[2]!) / 2, ...t.map((v, k) => (v + cross[k]!) / 2)];
}

describe('Stewart–Gough platform: the formulation', () => {
  const pose = { t: [0.1, -0.05, 1.2], e: [0.08, -0.12, 0.2] };
  const placed = placedPlatform([...pose.t, ...pose.e], p);
  const lengths = Object.fromEntries(placed.map((b, n) => [`r${n + 1}`, Math.hypot(...b.map((v, k) => v - joint('a', n + 1)[k]!))]));
  const params = paramsFrom(system.parameters, { ...p, ...lengths });

  it('a pose satisfies the seven quadrics with the leg lengths measured from it', () => {
    expect(largestResidual(system.equations, real(studyOf(pose.t, pose.e)), params)).toBeLessThan(1e-12);
  });

  it('a pose with one leg 1 cm too long does not', () => {
    const longer = paramsFrom(system.parameters, { ...p, ...lengths, r1: lengths.r1! + 0.01 });
    expect(largestResidual(system.equations, real(studyOf(pose.t, pose.e)), longer)).toBeGreaterThan(1e-3);
  });

  it('stores the pose as its translation and rotation parameters', () => {
    const x = Float64Array.from(studyOf(pose.t, pose.e).flatMap((v) => [v, 0]));
    const stored = Array.from(poseOfStudy(x)).filter((_, k) => k % 2 === 0);
    stored.forEach((v, k) => expect(v).toBeCloseTo([...pose.t, ...pose.e][k]!, 12));
  });
});

// 40 assembly modes of a general Stewart–Gough platform (Raghavan 1993, J. Mech. Des. 115, by continuation; proofs by
// Ronga–Vust, Lazard, Mourrain; Husty 1996 in these Study parameters). The 88 surplus paths must end at infinity on
// the surface e₀ = e = 0, g₀² + |g|² = 0 (our own derivation, see the definition's excess note).
describe('solving the Stewart–Gough platform', () => {
  it.each(seeds(4))('random complex platform %i: 40 poses, 88 paths at infinity on the surface of vanishing rotations', async (seed) => {
    const instance = randomInstance(seed);
    const { report } = await solveInstance(definition, instance);
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.bezoutBound).toBe(128);
    expect(report.solutions).toHaveLength(40);
    expect(report.stats).toMatchObject({ tracked: 128, regular: 40, singular: 0, atInfinity: 88, failed: 0 });
    const units = naturalUnits(system, parametersOf(definition, instance)).variables.map((c) => 2 ** c);
    for (const end of report.ends.filter((e) => e.outcome === 'at-infinity')) {
      expect(end.direction).toBe(true);
      const z = Array.from({ length: 7 }, (_, k) => [end.point[2 * k]! * units[k]!, end.point[2 * k + 1]! * units[k]!] as const);
      const size = (ks: number[]) => Math.max(...ks.map((k) => Math.hypot(...z[k]!)));
      const gg = [3, 4, 5, 6].reduce<[number, number]>((s, k) => [s[0] + z[k]![0] ** 2 - z[k]![1] ** 2, s[1] + 2 * z[k]![0] * z[k]![1]], [0, 0]);
      expect(size([0, 1, 2]) / size([3, 4, 5, 6])).toBeLessThan(1e-3);
      expect(Math.hypot(gg[0], gg[1]) / size([3, 4, 5, 6]) ** 2).toBeLessThan(1e-6);
    }
  });

  it('the motion rig: 40 poses, the real ones each with the six leg lengths', async () => {
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(40);
    expect(solved.real).toBe(16);
    const drawn = drawnRealSolutions(definition, demo, solved);
    expect(drawn.map((items) => items.filter((i) => i.layer === 'legs').length)).toEqual(new Array(16).fill(6));
    for (const s of solved.report.solutions) {
      const values = Array.from(poseOfStudy(s.point));
      if (values.some((v, k) => k % 2 === 1 && Math.abs(v) > 1e-7 * (1 + Math.abs(values[k - 1]!)))) continue;
      placedPlatform(values.filter((_, k) => k % 2 === 0), p).forEach((b, n) => {
        expect(Math.hypot(...b.map((v, k) => v - joint('a', n + 1)[k]!))).toBeCloseTo(p[`r${n + 1}`]!, 8);
      });
    }
  });
});
