import { describe, expect, it } from 'vitest';
import definition, { secondCamera, triangulate } from '../../../../generators/problems/mechanisms/relative-pose-from-five-point-pairs.ts';
import { cayleyRotation } from '../../../../generators/problems/mechanisms/cayley-rotation.ts';
import type { Vector3 as Triple } from '../../../../generators/problems/mechanisms/vector3.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { largestResidual, paramsFrom, real, type C } from '../shared/evaluate.ts';
import { drawnRealSolutions, demoInstance, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);
const demo = demoInstance(definition, 'courtyard');
const p = demo.parameters as Record<string, number>;

const times = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const plus = (...zs: C[]): C => zs.reduce<C>((s, z) => [s[0] + z[0], s[1] + z[1]], [0, 0]);
const scaled = (k: number, z: C): C => [k * z[0], k * z[1]];

/** The essential matrix [t]×M(s) of a packed complex solution (s₁, s₂, s₃, t₁, t₂), scaled so its largest entry is 1. */
function essentialOf(x: Float64Array): C[] {
  const z: C[] = Array.from({ length: 5 }, (_, k) => [x[2 * k]!, x[2 * k + 1]!]);
  const s = z.slice(0, 3), t: C[] = [z[3]!, z[4]!, [1, 0]];
  const ss = plus(...s.map((c) => times(c, c)));
  const skew = (v: C[]): C[][] => [[[0, 0], scaled(-1, v[2]!), v[1]!], [v[2]!, [0, 0], scaled(-1, v[0]!)], [scaled(-1, v[1]!), v[0]!, [0, 0]]];
  const S = skew(s), T = skew(t);
  const M = [0, 1, 2].map((r) => [0, 1, 2].map((c) => plus(r === c ? plus([1, 0], scaled(-1, ss)) : [0, 0], scaled(2, times(s[r]!, s[c]!)), scaled(2, S[r]![c]!))));
  const E = [0, 1, 2].flatMap((r) => [0, 1, 2].map((c) => plus(...[0, 1, 2].map((k) => times(T[r]![k]!, M[k]![c]!)))));
  const big = E.reduce((b, e) => (Math.hypot(...e) > Math.hypot(...b) ? e : b));
  const inverse: C = [big[0] / (big[0] ** 2 + big[1] ** 2), -big[1] / (big[0] ** 2 + big[1] ** 2)];
  return E.map((e) => times(e, inverse));
}

/** Cayley vector of a rotation matrix (rows): vee(R − Rᵀ)/(1 + tr R). */
function cayleyOf(R: Triple[]): Triple {
  const trace = R[0]![0] + R[1]![1] + R[2]![2];
  return [R[2]![1] - R[1]![2], R[0]![2] - R[2]![0], R[1]![0] - R[0]![1]].map((v) => v / (1 + trace)) as Triple;
}

/** Every 'excess' end has Cayley parameters with 1 + s·s = 0 (to 1e-6). */
function expectOnIsotropicSurface(ends: readonly { outcome: string; point: Float64Array }[]): void {
  for (const end of ends.filter((e) => e.outcome === 'excess')) {
    const ss = [0, 1, 2].reduce<C>((acc, k) => plus(acc, times([end.point[2 * k]!, end.point[2 * k + 1]!], [end.point[2 * k]!, end.point[2 * k + 1]!])), [1, 0]);
    expect(Math.hypot(...ss)).toBeLessThan(1e-6);
  }
}

const multiply = (A: Triple[], B: Triple[]): Triple[] => A.map((row) => [0, 1, 2].map((c) => row[0] * B[0]![c]! + row[1] * B[1]![c]! + row[2] * B[2]![c]!) as Triple);

describe('five-point relative pose: the formulation', () => {
  // A scene of our own: a pose, five points, their two images.
  const s: Triple = [0.05, -0.2, 0.03], t: Triple = [-1.1, 0.2, 0.3];
  const R = cayleyRotation(s);
  const scene: Triple[] = [[0.3, 0.2, 4], [-1, 0.5, 5], [1.2, -0.4, 6], [-0.2, -1, 3.5], [0.7, 0.9, 7]];
  const images: Record<string, number> = {};
  scene.forEach((X, n) => {
    const Y = [0, 1, 2].map((r) => R[r]![0] * X[0] + R[r]![1] * X[1] + R[r]![2] * X[2] + t[r]!);
    Object.assign(images, { [`x${n + 1}`]: X[0] / X[2], [`y${n + 1}`]: X[1] / X[2], [`u${n + 1}`]: Y[0]! / Y[2]!, [`v${n + 1}`]: Y[1]! / Y[2]! });
  });
  const params = paramsFrom(system.parameters, images);
  const chart = [...s, t[0] / t[2], t[1] / t[2]];

  it('the pose that made the images satisfies the five epipolar equations', () => {
    expect(largestResidual(system.equations, real(chart), params)).toBeLessThan(1e-12);
  });

  it('so does its twist by a half-turn about the baseline, with the same essential matrix up to sign', () => {
    const n = Math.hypot(...t);
    const halfTurn = [0, 1, 2].map((r) => [0, 1, 2].map((c) => (2 * t[r]! * t[c]!) / (n * n) - (r === c ? 1 : 0))) as Triple[];
    const twisted = [...cayleyOf(multiply(halfTurn, R)), t[0] / t[2], t[1] / t[2]];
    expect(largestResidual(system.equations, real(twisted), params)).toBeLessThan(1e-10);
    const e1 = essentialOf(Float64Array.from(chart.flatMap((v) => [v, 0])));
    const e2 = essentialOf(Float64Array.from(twisted.flatMap((v) => [v, 0])));
    e1.forEach((e, k) => expect(Math.hypot(e[0] - e2[k]![0], e[1] - e2[k]![1])).toBeLessThan(1e-12));
  });

  it('triangulates the scene back from the true pose (baseline scaled to 1)', () => {
    const scale = Math.hypot(...t);
    scene.forEach((X, n) => triangulate(chart, images, n + 1).forEach((v, k) => expect(v * scale).toBeCloseTo(X[k]!, 9)));
  });
});

// 10 essential matrices from five general point pairs (Demazure 1988, from memory; Nistér 2004, IEEE TPAMI 26(6)),
// each from two rotations (the twisted pair, classical, from memory): 20 relative poses. The surplus paths end on
// the surface 1 + s·s = 0 or at infinity (our own derivation, see the definition's excess note).
describe('solving the five-point relative pose', () => {
  it.each(seeds(3))('random complex matches %i: 20 poses making 10 essential matrices, each twice', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.bezoutBound).toBe(243);
    expect(report.solutions).toHaveLength(20);
    expect(report.stats).toMatchObject({ tracked: 243, regular: 20, singular: 0, failed: 0 });
    expect(report.stats.excess + report.stats.atInfinity).toBe(223);
    expectOnIsotropicSurface(report.ends);
    const essentials = report.solutions.map((so) => essentialOf(so.point));
    const partners = essentials.map((e) => essentials.filter((f) => f.every((v, k) => Math.hypot(v[0] - e[k]![0], v[1] - e[k]![1]) < 1e-6)).length);
    expect(partners).toEqual(new Array(20).fill(2));
  });

  it.each(seeds(2))('random complex matches %i, two-homogeneous start: 20 poses of 80 paths, the other 60 on the surface 1 + s·s = 0', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed), 'multihomogeneous');
    expect(report.multihomogeneousBound).toBe(80);
    expect(report.solutions).toHaveLength(20);
    expect(report.stats).toMatchObject({ tracked: 80, regular: 20, excess: 60, atInfinity: 0, failed: 0 });
    expectOnIsotropicSurface(report.ends);
  });

  it('the courtyard: 20 poses; each real one reconstructs the five points where the two rays meet', async () => {
    const solved = await solveInstance(definition, demo);
    expect(solved.report.solutions).toHaveLength(20);
    expect(solved.real).toBe(12);
    const drawn = drawnRealSolutions(definition, demo, solved);
    expect(drawn).toHaveLength(solved.real);
    expect(drawn.map((items) => items.filter((i) => i.layer === 'scene points').length)).toEqual(new Array(solved.real).fill(5));
    for (const so of solved.report.solutions.filter((x) => Array.from(x.point).every((v, k) => k % 2 === 0 || Math.abs(v) < 1e-8))) {
      const values = Array.from(so.point).filter((_, k) => k % 2 === 0);
      const { rotation, centre } = secondCamera(values);
      for (const i of [1, 2, 3, 4, 5]) {
        // The midpoint lies on both rays: its image in either camera is the matched point.
        const X = triangulate(values, p, i);
        const Y = [0, 1, 2].map((r) => rotation[r]!.reduce((acc, v, c) => acc + v * (X[c]! - centre[c]!), 0));
        expect(X[0] / X[2] - p[`x${i}`]!).toBeCloseTo(0, 6);
        expect(Y[0]! / Y[2]! - p[`u${i}`]!).toBeCloseTo(0, 6);
      }
    }
  });
});
