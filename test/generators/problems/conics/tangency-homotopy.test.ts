import { describe, expect, it } from 'vitest';
import { createRandom, matVec } from '../../../../src/engine/index.ts';
import { createHomotopy } from '../../../../generators/problems/conics/tangency-homotopy.ts';
import { randomChart, tangencySeed } from '../../../../generators/problems/conics/tangency-seed.ts';
import { parameterCount, unknownCount } from '../../../../generators/problems/conics/tangency-layout.ts';

const shapes = [0, 1, 2, 3, 4, 5].map((points) => ({ points, conics: 5 - points }));

function maxAbs(v: Float64Array): number {
  let m = 0;
  for (let i = 0; i < v.length; i += 2) m = Math.max(m, Math.hypot(v[i]!, v[i + 1]!));
  return m;
}

describe.each(shapes)('tangency homotopy through $points points, tangent to $conics conics', (shape) => {
  const random = createRandom(11 + shape.points);
  const chart = randomChart(shape, random);
  const seed = tangencySeed(shape, chart, random);
  const np = parameterCount(shape), n = unknownCount(shape);
  const target = new Float64Array(2 * np);
  for (let j = 0; j < np; j++) random.gaussianComplex(target, 2 * j);
  const H = createHomotopy({ ...shape, chart, from: seed.parameters, to: target, gamma: [0.6, 0.8] });
  const h = new Float64Array(2 * n), jac = new Float64Array(2 * n * n), ht = new Float64Array(2 * n);

  it('the solution-first seed solves the start system to machine precision', () => {
    H.evaluate(seed.solution, 0, 0, h, jac, ht);
    expect(maxAbs(h)).toBeLessThan(1e-10);
  });

  it('the Jacobian and the t-derivative agree with central differences (common practice, no source)', () => {
    const x = seed.solution.slice();
    for (let i = 0; i < x.length; i++) x[i] = x[i]! + 0.3 * random.normal();
    const tRe = 0.37, tIm = 0.05, eps = 1e-6;
    H.evaluate(x, tRe, tIm, h, jac, ht);
    const hp = new Float64Array(2 * n), hm = new Float64Array(2 * n);
    for (let j = 0; j < n; j++) {
      const xp = x.slice(), xm = x.slice();
      xp[2 * j] = xp[2 * j]! + eps; xm[2 * j] = xm[2 * j]! - eps;
      H.evaluateValue!(xp, tRe, tIm, hp); H.evaluateValue!(xm, tRe, tIm, hm);
      for (let i = 0; i < n; i++) {
        expect((hp[2 * i]! - hm[2 * i]!) / (2 * eps)).toBeCloseTo(jac[2 * (i * n + j)]!, 5);
        expect((hp[2 * i + 1]! - hm[2 * i + 1]!) / (2 * eps)).toBeCloseTo(jac[2 * (i * n + j) + 1]!, 5);
      }
    }
    H.evaluateValue!(x, tRe + eps, tIm, hp); H.evaluateValue!(x, tRe - eps, tIm, hm);
    for (let i = 0; i < n; i++) {
      expect((hp[2 * i]! - hm[2 * i]!) / (2 * eps)).toBeCloseTo(ht[2 * i]!, 5);
      expect((hp[2 * i + 1]! - hm[2 * i + 1]!) / (2 * eps)).toBeCloseTo(ht[2 * i + 1]!, 5);
    }
  });

  it('the arrowhead solver solves with the Jacobian to a small backward error', () => {
    H.evaluate(seed.solution, 0.5, 0, h, jac, ht);
    const solver = H.createSolver!();
    const copy = jac.slice();
    expect(solver.factor(copy)).toBeLessThan(1e12);
    const b = new Float64Array(2 * n);
    for (let i = 0; i < 2 * n; i++) b[i] = random.normal();
    const y = new Float64Array(2 * n);
    solver.solve(b, y);
    const ay = new Float64Array(2 * n);
    matVec(ay, jac, y, n, n);
    ay.forEach((v, i) => expect(v).toBeCloseTo(b[i]!, 8));
  });
});
