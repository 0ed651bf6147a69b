import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/circles/circles-tangent-to-three-circles.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { evaluate, real } from '../shared/evaluate.ts';
import { drawnRealSolutions, demoInstance, planeDrawing, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const demo = definition.instances.find((i) => i.id === 'three-ponds')!;
const p = demo.parameters as Record<string, number>;
const circles = [1, 2, 3].map((i) => ({ a: p[`a${i}`]!, b: p[`b${i}`]!, r: p[`r${i}`]! }));

/**
 * Reference: the classical algebraic solution (as in Viète's reconstruction): for each choice of signs sᵢ the
 * centre (x, y) and radius R satisfy |c − aᵢ| = R + sᵢrᵢ; differences of the squared equations are linear in
 * (x, y, R), leaving one quadratic in R. Real circles with R > 0 only.
 */
function classicalTangentCircles(): { x: number; y: number; R: number }[] {
  const out: { x: number; y: number; R: number }[] = [];
  const [c1, c2, c3] = circles as [typeof circles[0], typeof circles[0], typeof circles[0]];
  for (const s of [[1, 1, 1], [1, 1, -1], [1, -1, 1], [1, -1, -1], [-1, 1, 1], [-1, 1, -1], [-1, -1, 1], [-1, -1, -1]]) {
    // Row k: 2(a1 − ak)x + 2(b1 − bk)y + 2(s1 r1 − sk rk)R = (a1² + b1² − r1²) − (ak² + bk² − rk²).
    const row = (c: typeof c1, sk: number) => [2 * (c1.a - c.a), 2 * (c1.b - c.b), 2 * (s[0]! * c1.r - sk * c.r), c1.a ** 2 + c1.b ** 2 - c1.r ** 2 - (c.a ** 2 + c.b ** 2 - c.r ** 2)];
    const [m, n] = [row(c2, s[1]!), row(c3, s[2]!)] as [number[], number[]];
    const det = m[0]! * n[1]! - m[1]! * n[0]!;
    // (x, y) = P + Q·R.
    const P = [(m[3]! * n[1]! - m[1]! * n[3]!) / det, (m[0]! * n[3]! - m[3]! * n[0]!) / det];
    const Q = [(-m[2]! * n[1]! + m[1]! * n[2]!) / det, (-m[0]! * n[2]! + m[2]! * n[0]!) / det];
    const u = [P[0]! - c1.a, P[1]! - c1.b];
    const A = Q[0]! ** 2 + Q[1]! ** 2 - 1, B = 2 * (u[0]! * Q[0]! + u[1]! * Q[1]!) - 2 * s[0]! * c1.r, C = u[0]! ** 2 + u[1]! ** 2 - c1.r ** 2;
    const disc = B * B - 4 * A * C;
    if (disc < 0) continue;
    for (const R of [(-B + Math.sqrt(disc)) / (2 * A), (-B - Math.sqrt(disc)) / (2 * A)]) {
      if (R > 0) out.push({ x: P[0]! + Q[0]! * R, y: P[1]! + Q[1]! * R, R });
    }
  }
  return out;
}

describe('circles tangent to three circles (Apollonius)', () => {
  const system = systemOf(definition);
  const reference = classicalTangentCircles();

  it('the demo ponds have 8 real tangent circles by the classical construction (Viète 1600)', () => {
    expect(reference).toHaveLength(8);
  });

  it.each(reference.map((c, k) => [k, c] as const))('tangent circle %i satisfies the three quadrics', (_, c) => {
    const x = real([-2 * c.x, -2 * c.y, c.x ** 2 + c.y ** 2 - c.R ** 2]);
    const params = real(definition.formulation.parameters.map((n) => p[n]!));
    for (const e of system.equations) {
      const [re, im] = evaluate(e, x, params);
      expect(Math.hypot(re, im)).toBeLessThan(1e-9 * (1 + c.R ** 4));
    }
  });

  it('draws a real solution as its circle on the solution layer', () => {
    const c = reference[0]!;
    const items = definition.drawing!.solution([-2 * c.x, -2 * c.y, c.x ** 2 + c.y ** 2 - c.R ** 2], p);
    expect(items).toHaveLength(1);
    expect(items[0]).toMatchObject({ shape: 'circle', layer: 'solution' });
    expect((items[0] as { r: number }).r).toBeCloseTo(c.R, 9);
  });

  it('fits the window around the given circles and all solution circles', () => {
    const items = reference.map((c) => ({ shape: 'circle' as const, cx: c.x, cy: c.y, r: c.R, layer: 'solution' }));
    const w = planeDrawing(definition).window(p, items);
    for (const c of reference) {
      expect(c.x - c.R).toBeGreaterThanOrEqual(w.xMin);
      expect(c.x + c.R).toBeLessThanOrEqual(w.xMax);
      expect(c.y - c.R).toBeGreaterThanOrEqual(w.yMin);
      expect(c.y + c.R).toBeLessThanOrEqual(w.yMax);
    }
  });
});

// Apollonius' problem: 8 circles tangent to three general circles (Viète 1600; Drechsler–Sterz,
// Acta Math. Univ. Comenianae 68 (1999), 2^(n+1) in n-space).
describe('solving circles tangent to three circles', () => {
  it.each(seeds(20))('random complex instance %i: 8 tangent circles, every path regular, none failed', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.bezoutBound).toBe(8);
    expect(report.solutions).toHaveLength(8);
    expect(report.stats).toMatchObject({ tracked: 8, regular: 8, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the three ponds: 8 tangent circles found, all 8 real', async () => {
    const solved = await solveInstance(definition, demoInstance(definition, 'three-ponds'));
    expect(solved.report.solutions).toHaveLength(8);
    expect(solved.real).toBe(8);
    const drawn = drawnRealSolutions(definition, demoInstance(definition, 'three-ponds'), solved).flat();
    expect(drawn.filter((i) => i.shape === 'circle' && i.layer === 'solution')).toHaveLength(8);
  });
});
