import { describe, expect, it } from 'vitest';
import { compileSystem, createRandom, degree, gammaArc, matVec } from '../../../../src/engine/index.ts';
import { createHomotopy } from '../../../../generators/problems/conics/tangency-homotopy.ts';
import { tangencySystem } from '../../../../generators/problems/conics/tangency-system.ts';
import { randomChart, tangencySeed } from '../../../../generators/problems/conics/tangency-seed.ts';
import { parameterCount, unknownCount } from '../../../../generators/problems/conics/tangency-layout.ts';

describe.each([0, 2, 4].map((points) => ({ points, conics: 5 - points })))('tangency system through $points points, $conics conics', (shape) => {
  const random = createRandom(5 + shape.points);
  const chart = randomChart(shape, random);
  const system = tangencySystem(shape, chart);
  const n = unknownCount(shape), np = parameterCount(shape);

  it('has degrees at most 3, as in Breiding–Sturmfels–Timme, Notices AMS 67 (2020)', () => {
    const degrees = system.equations.map((e) => degree(e));
    expect(degrees).toEqual([1, ...Array(shape.points).fill(1), ...Array(shape.conics).fill([2, 3, 3]).flat()]);
  });

  it('the compiled graph and the hand-written evaluator agree (values, Jacobian, t-derivative)', () => {
    const seed = tangencySeed(shape, chart, random);
    const to = new Float64Array(2 * np);
    for (let j = 0; j < np; j++) random.gaussianComplex(to, 2 * j);
    const gamma = [0.28, -0.96] as const;
    const H = createHomotopy({ ...shape, chart, from: seed.parameters, to, gamma });
    const x = seed.solution.map((v) => v + 0.2 * random.normal());
    const h = new Float64Array(2 * n), jac = new Float64Array(2 * n * n), ht = new Float64Array(2 * n);
    H.evaluate(x, 0.4, 0, h, jac, ht);
    const arc = new Float64Array(4);
    gammaArc(0.4, 0, gamma[0], gamma[1], arc);
    const p = new Float64Array(2 * np), dp = new Float64Array(2 * np);
    for (let j = 0; j < np; j++) {
      const dr = to[2 * j]! - seed.parameters[2 * j]!, di = to[2 * j + 1]! - seed.parameters[2 * j + 1]!;
      p[2 * j] = seed.parameters[2 * j]! + arc[0]! * dr - arc[1]! * di;
      p[2 * j + 1] = seed.parameters[2 * j + 1]! + arc[0]! * di + arc[1]! * dr;
      dp[2 * j] = arc[2]! * dr - arc[3]! * di;
      dp[2 * j + 1] = arc[2]! * di + arc[3]! * dr;
    }
    const compiled = compileSystem(system);
    const v = new Float64Array(2 * n), jx = new Float64Array(2 * n * n), jp = new Float64Array(2 * n * np);
    compiled.evaluate(x, p, v, jx, jp);
    const scale = 1 + Math.max(...Array.from(v, Math.abs));
    v.forEach((value, i) => expect(Math.abs(value - h[i]!) / scale).toBeLessThan(1e-12));
    jx.forEach((value, i) => expect(Math.abs(value - jac[i]!) / scale).toBeLessThan(1e-12));
    const jpdp = new Float64Array(2 * n);
    matVec(jpdp, jp, dp, n, np);
    jpdp.forEach((value, i) => expect(Math.abs(value - ht[i]!) / scale).toBeLessThan(1e-11));
  });
});
