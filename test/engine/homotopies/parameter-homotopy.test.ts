import { describe, expect, it } from 'vitest';
import type { PolynomialSystem } from '../../../src/engine/expr/node.ts';
import { add, mul, param, pow, sub, unknown } from '../../../src/engine/expr/build.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { parameterHomotopy } from '../../../src/engine/homotopies/parameter-homotopy.ts';
import { gammaArc } from '../../../src/engine/parameter/gamma-arc.ts';
import { createTracker } from '../../../src/engine/track/tracker.ts';
import { solveSystem } from '../../../src/engine/solve/solve-system.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { distInf } from '../../../src/engine/complex/packed.ts';

// Two conics with all twelve coefficients as parameters: a1 x² + a2 xy + a3 y² + a4 x + a5 y + a6 (and b…).
const x = unknown('x', 0), y = unknown('y', 1);
const monomials = [pow(x, 2), mul(x, y), pow(y, 2), x, y, 1];
const names = [...'abcdef'].flatMap((_, k) => [`a${k}`, `b${k}`]);
const conic = (offset: number) => add(...monomials.map((m, k) => mul(param(`c${offset + k}`, offset + k), m)));
const system: PolynomialSystem = { unknowns: ['x', 'y'], parameters: names, equations: [conic(0), conic(6)] };

const randomParameters = (seed: number): Float64Array => {
  const r = createRandom(seed);
  const p = new Float64Array(24);
  for (let k = 0; k < 12; k++) r.gaussianComplex(p, 2 * k);
  return p;
};

describe('coefficient-parameter homotopy (Morgan–Sommese, Appl. Math. Comput. 29, 1989)', () => {
  it.each([1, 2, 3])('carries the 4 intersection points of two conics to those of other conics (Bézout 1779; seed %i)', async (seed) => {
    const p0 = randomParameters(100 + seed), p1 = randomParameters(200 + seed);
    const [start, target] = await Promise.all([solveSystem(system, p0, { seed }), solveSystem(system, p1, { seed })]);
    expect(start.solutions).toHaveLength(4);
    const gamma = new Float64Array(2);
    createRandom(seed).unitComplex(gamma, 0);
    const tracker = createTracker(parameterHomotopy(compileSystem(system), p0, p1, gamma));
    const ends = start.solutions.map((s) => tracker.track(s.point));
    for (const e of ends) {
      expect(e.outcome).toBe('regular');
      expect(e.residual).toBeLessThan(1e-13);
      // each end is one of the target's solutions, and all four are reached (no path jumping)
      expect(target.solutions.some((s) => distInf(s.point, e.point) < 1e-8)).toBe(true);
    }
    const hit = new Set(ends.map((e) => target.solutions.findIndex((s) => distInf(s.point, e.point) < 1e-8)));
    expect(hit.size).toBe(4);
  });

  it('∂H/∂t matches a central finite difference in t (error O(h²), h = 1e-6)', () => {
    const p0 = randomParameters(1), p1 = randomParameters(2);
    const gamma = new Float64Array([0.6, 0.8]);
    const H = parameterHomotopy(compileSystem(system), p0, p1, gamma);
    const z = new Float64Array([0.3, -0.2, 1.1, 0.4]);
    const h = new Float64Array(4), jac = new Float64Array(8), ht = new Float64Array(4), hp = new Float64Array(4), hm = new Float64Array(4);
    H.evaluate(z, 0.4, 0.1, h, jac, ht);
    H.evaluate(z, 0.4 + 1e-6, 0.1, hp, jac, new Float64Array(4));
    H.evaluate(z, 0.4 - 1e-6, 0.1, hm, jac, new Float64Array(4));
    for (let i = 0; i < 4; i++) expect(ht[i]).toBeCloseTo((hp[i]! - hm[i]!) / 2e-6, 6);
  });

  it('starts at p0 and ends at p1 (τ(0) = 0, τ(1) = 1 with the gamma trick)', () => {
    const p0 = randomParameters(3), p1 = randomParameters(4);
    const compiled = compileSystem(system);
    const H = parameterHomotopy(compiled, p0, p1, new Float64Array([-0.28, 0.96]));
    const z = new Float64Array([0.5, 0.5, -1, 2]);
    const v = new Float64Array(4), h = new Float64Array(4), jac = new Float64Array(8), ht = new Float64Array(4);
    for (const [t, p] of [[0, p0], [1, p1]] as const) {
      H.evaluate(z, t, 0, h, jac, ht);
      compiled.evaluate(z, p, v, null, null);
      for (let i = 0; i < 4; i++) expect(h[i]).toBeCloseTo(v[i]!, 13);
    }
  });

  it.each([[0.25, 0], [0.5, 0.1], [0.9, -0.2]])('with gamma moves the parameters along the arc of gamma-arc.ts, τ(t) = t / (γ(1 − t) + t), at t = %f + %fi', (tRe, tIm) => {
    // One gamma convention for every parameter homotopy of the engine (a ParameterLeg with γ traces the same arc).
    const compiled = compileSystem({ unknowns: ['x'], parameters: ['c'], equations: [sub(x, param('c', 0))] });
    const p0 = new Float64Array([1, 2]), p1 = new Float64Array([-3, 0.5]), gamma = [0.6, 0.8] as const;
    const h = new Float64Array(2), jac = new Float64Array(2), ht = new Float64Array(2), arc = new Float64Array(4);
    parameterHomotopy(compiled, p0, p1, gamma).evaluate(new Float64Array(2), tRe, tIm, h, jac, ht);
    // by hand: d = γ(1 − t) + t, τ = t / d
    const dRe = gamma[0] * (1 - tRe) + gamma[1] * tIm + tRe, dIm = gamma[1] * (1 - tRe) - gamma[0] * tIm + tIm, dd = dRe * dRe + dIm * dIm;
    const tauRe = (tRe * dRe + tIm * dIm) / dd, tauIm = (tIm * dRe - tRe * dIm) / dd;
    const deltaRe = p1[0]! - p0[0]!, deltaIm = p1[1]! - p0[1]!;
    expect(-h[0]!).toBeCloseTo(p0[0]! + tauRe * deltaRe - tauIm * deltaIm, 14);
    expect(-h[1]!).toBeCloseTo(p0[1]! + tauRe * deltaIm + tauIm * deltaRe, 14);
    gammaArc(tRe, tIm, gamma[0], gamma[1], arc);
    expect(arc[0]).toBeCloseTo(tauRe, 14);
    expect(arc[1]).toBeCloseTo(tauIm, 14);
  });

  it('refuses a non-square system and wrong parameter lengths with clear messages', () => {
    const compiled = compileSystem({ ...system, equations: [conic(0)] });
    expect(() => parameterHomotopy(compiled, randomParameters(1), randomParameters(2))).toThrow(/square system, got 1 equations in 2 unknowns/);
    expect(() => parameterHomotopy(compileSystem(system), new Float64Array(2), randomParameters(2))).toThrow(/length 24/);
  });
});

describe('tracker', () => {
  it('follows x² = (1 − t)·γ + 4t from x = √γ to the root of x² = 4 (hand solvable: x(t) = √((1 − t)γ + 4t))', () => {
    const H = parameterHomotopy(
      compileSystem({ unknowns: ['x'], parameters: ['c'], equations: [sub(pow(x, 2), param('c', 0))] }),
      new Float64Array([0.6, 0.8]),
      new Float64Array([4, 0]),
    );
    const half = Math.atan2(0.8, 0.6) / 2; // √γ for γ = 0.6 + 0.8i
    const end = createTracker(H).track(new Float64Array([Math.cos(half), Math.sin(half)]));
    expect(end.outcome).toBe('regular');
    expect(end.point[0]).toBeCloseTo(2, 12); // the branch with positive real part never crosses Re x = 0
    expect(end.point[1]).toBeCloseTo(0, 12);
    expect(end.windingNumber).toBe(1);
    expect(end.steps).toBeGreaterThan(0);
  });

  it('rejects a start point of the wrong length', () => {
    const H = parameterHomotopy(compileSystem(system), randomParameters(1), randomParameters(2));
    expect(() => createTracker(H).track(new Float64Array(2))).toThrow(/length 2, expected 4/);
  });
});
