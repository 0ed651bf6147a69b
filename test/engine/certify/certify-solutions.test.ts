import { describe, expect, it } from 'vitest';
import { add, constant, mul, param, pow, sub, unknown } from '../../../src/engine/expr/build.ts';
import type { PolynomialSystem } from '../../../src/engine/expr/node.ts';
import { certifySolutions, prepareCertifier } from '../../../src/engine/certify/certify-solutions.ts';

const x = unknown('x', 0), y = unknown('y', 1);
const pack = (...values: number[]): Float64Array => Float64Array.from(values);

// Two conics in general position: p0·X² + p1·Y² = p2 and p3·X² + p4·Y² = p5 in coordinates (X, Y) rotated by
// (c, s) and shifted by (t1, t2) from (x, y), so the conics are not axis-aligned in the unknowns. Their points
// follow from the linear system in (X², Y²), so the test knows them; Bézout (1779): two conics meet in 4 points.
const [c, s, t1, t2] = [0.6, 0.8, 0.3, -1.7];
const X = add(mul(c, sub(x, t1)), mul(s, sub(y, t2)));
const Y = add(mul(-s, sub(x, t1)), mul(c, sub(y, t2)));
const conics: PolynomialSystem = {
  unknowns: ['x', 'y'],
  parameters: ['p0', 'p1', 'p2', 'p3', 'p4', 'p5'],
  equations: [
    sub(add(mul(param('p0', 0), pow(X, 2)), mul(param('p1', 1), pow(Y, 2))), param('p2', 2)),
    sub(add(mul(param('p3', 3), pow(X, 2)), mul(param('p4', 4), pow(Y, 2))), param('p5', 5)),
  ],
};
function conicPoints(p: number[]): Float64Array[] {
  const det = p[0]! * p[4]! - p[1]! * p[3]!;
  const X2 = (p[2]! * p[4]! - p[1]! * p[5]!) / det, Y2 = (p[0]! * p[5]! - p[2]! * p[3]!) / det;
  const root = (v: number): [number, number] => (v >= 0 ? [Math.sqrt(v), 0] : [0, Math.sqrt(-v)]);
  const [xr, xi] = root(X2), [yr, yi] = root(Y2);
  const points: Float64Array[] = [];
  for (const sx of [1, -1]) for (const sy of [1, -1]) {
    const Xp = [sx * xr, sx * xi], Yp = [sy * yr, sy * yi];
    points.push(pack(t1 + c * Xp[0]! - s * Yp[0]!, c * Xp[1]! - s * Yp[1]!, t2 + s * Xp[0]! + c * Yp[0]!, s * Xp[1]! + c * Yp[1]!));
  }
  return points;
}
const complexParameters = (p: number[]): Float64Array => Float64Array.from(p.flatMap((v) => [v, 0]));

describe('certifying solutions', () => {
  it('two real conics meeting in 4 real points: all 4 certified, distinct and real (Bézout)', () => {
    const p = [1, 2.5, 4, 3, -1, 2];
    const report = certifySolutions(conics, complexParameters(p), conicPoints(p));
    expect([report.certified, report.certifiedDistinct, report.certifiedReal]).toEqual([4, 4, 4]);
    for (const solution of report.solutions) expect(solution.radius).toBeLessThan(1e-9);
  });

  it('complex-conjugate pairs: all 4 certified and distinct, none certified real', () => {
    const p = [1, 2.5, 4, 3, 1, -2]; // Y² < 0: two conjugate pairs
    const points = conicPoints(p);
    expect(points.every((q) => Math.abs(q[1]!) + Math.abs(q[3]!) > 0.1)).toBe(true);
    const report = certifySolutions(conics, complexParameters(p), points);
    expect([report.certified, report.certifiedDistinct, report.certifiedReal]).toEqual([4, 4, 0]);
  });

  it('with complex parameters the same points are certified but never called real', () => {
    const p = [1, 2.5, 4, 3, -1, 2];
    const parameters = complexParameters(p);
    parameters[1] = 1e-300; // a complex instance: realness cannot be concluded
    const report = certifySolutions(conics, parameters, conicPoints(p));
    expect([report.certified, report.certifiedReal]).toEqual([4, 0]);
  });

  it('refuses a perturbed wrong point and a far-away point, saying why', () => {
    const p = [1, 2.5, 4, 3, -1, 2];
    const near = conicPoints(p)[0]!.slice();
    near[0] = near[0]! + 1e-3;
    const report = certifySolutions(conics, complexParameters(p), [near, pack(5, 0, 5, 0)]);
    expect(report.certified).toBe(0);
    expect(report.solutions[0]!.reason).toMatch(/not close enough/);
    expect(report.solutions[1]!.reason).toMatch(/not close enough|Krawczyk/);
  });

  it('counts two boxes around the same solution once (the hull holds exactly one solution)', () => {
    const p = [1, 2.5, 4, 3, -1, 2];
    const [first] = conicPoints(p);
    const nudged = first!.slice();
    nudged[0] = nudged[0]! + 1e-13;
    const report = certifySolutions(conics, complexParameters(p), [first!, nudged, first!.slice()]);
    expect([report.certified, report.certifiedDistinct]).toEqual([3, 1]);
    expect(report.solutions[1]!.sameAs).toBe(0);
    expect(report.solutions[2]!.sameAs).toBe(0);
  });

  it.each([
    // x² = 0 and y = 1: a double root at (0, 1)
    ['a double root x² = 0, exactly', { unknowns: ['x', 'y'], parameters: [], equations: [pow(x, 2), sub(y, 1)] }, pack(0, 0, 1, 0)],
    ['a double root x² = 0, approximately', { unknowns: ['x', 'y'], parameters: [], equations: [pow(x, 2), sub(y, 1)] }, pack(1e-9, 0, 1, 0)],
    // circles x² + y² = 1 and (x − 2)² + y² = 1 touch at (1, 0): a tangential (double) intersection
    ['two tangent conics at their point of contact', {
      unknowns: ['x', 'y'], parameters: [],
      equations: [sub(add(pow(x, 2), pow(y, 2)), 1), sub(add(pow(sub(x, 2), 2), pow(y, 2)), 1)],
    }, pack(1 + 1e-10, 0, 1e-10, 0)],
  ] as [string, PolynomialSystem, Float64Array][])('refuses a singular solution: %s', (_name, system, point) => {
    const report = certifySolutions(system, new Float64Array(0), [point]);
    expect(report.certified).toBe(0);
    expect(report.solutions[0]!.reason).toBeTruthy();
  });

  it('separates two regular roots 1e-11 apart, which double-precision residuals cannot (exact residual fallback)', () => {
    // x² − (1 + c)x + c = 0 with c = 1 + 1e-11 (as a double), and y = 0: roots near (1, 0) and (c, 0)
    const close = 1 + 1e-11;
    const system: PolynomialSystem = { unknowns: ['x', 'y'], parameters: [], equations: [add(sub(pow(x, 2), mul(1 + close, x)), close), y] };
    const report = certifySolutions(system, new Float64Array(0), [pack(1, 0, 0, 0), pack(close, 0, 0, 0)]);
    expect([report.certified, report.certifiedDistinct, report.certifiedReal]).toEqual([2, 2, 2]);
    for (const solution of report.solutions) expect(solution.radius).toBeLessThan(5e-12);
  });

  it('never calls a solution real when the system has complex constants (random complex chart)', () => {
    // (1 + i)(x − 2) = 0, y² = 4 (y = 2 given): the solution (2, 2) is real, but the system is not
    const system: PolynomialSystem = { unknowns: ['x', 'y'], parameters: [], equations: [mul(constant(1, 1), sub(x, 2)), sub(pow(y, 2), 4)] };
    const report = certifySolutions(system, new Float64Array(0), [pack(2, 0, 2, 0)]);
    expect([report.certified, report.certifiedReal]).toEqual([1, 0]);
  });

  it('rejects realParameters claimed for complex parameters, and points of the wrong length', () => {
    const certifier = prepareCertifier(conics);
    const p = complexParameters([1, 2.5, 4, 3, -1, 2]);
    p[3] = 0.5;
    expect(() => certifier.certify(p, [], { realParameters: true })).toThrow(/parameter 1 has imaginary part/);
    expect(() => certifier.certify(complexParameters([1, 2, 3, 4, 5, 6]), [pack(1, 2)])).toThrow(/solution 0 has 2 numbers, expected 4/);
  });
});

// Circles tangent to three given circles (Apollonius' problem): 8 for three general circles (Viète 1600). With signed
// radii Rᵢ = ±rᵢ, unknowns (a, b, r): (a − xᵢ)² + (b − yᵢ)² = (r + Rᵢ)². Each of the 4 sign classes (up to a global
// sign) has 2 solutions: differences of the equations are linear, leaving a quadratic in r.
describe("Apollonius' problem", () => {
  const a = unknown('a', 0), b = unknown('b', 1), r = unknown('r', 2);
  const system: PolynomialSystem = {
    unknowns: ['a', 'b', 'r'],
    parameters: ['x1', 'y1', 'R1', 'x2', 'y2', 'R2', 'x3', 'y3', 'R3'],
    equations: [0, 1, 2].map((i) => sub(add(pow(sub(a, param(`x${i + 1}`, 3 * i)), 2), pow(sub(b, param(`y${i + 1}`, 3 * i + 1)), 2)), pow(add(r, param(`R${i + 1}`, 3 * i + 2)), 2))),
  };
  const circles = [[0, 0, 1], [6, 1, 1.5], [2, 5, 0.8]] as const; // three mutually exterior circles of our own

  function tangentCircles(R: number[]): Float64Array[] {
    const [[x1, y1], [x2, y2], [x3, y3]] = circles;
    const k = (i: number): number => circles[i]![0] ** 2 + circles[i]![1] ** 2 - R[i]! ** 2;
    // 2(xᵢ − x₁)a + 2(yᵢ − y₁)b = kᵢ − k₁ − 2(Rᵢ − R₁)r, i = 2, 3; Cramer's rule gives a, b affine in r
    const m = [[2 * (x2 - x1), 2 * (y2 - y1)], [2 * (x3 - x1), 2 * (y3 - y1)]];
    const det = m[0]![0]! * m[1]![1]! - m[0]![1]! * m[1]![0]!;
    const solve = (u: number, v: number): [number, number] => [(u * m[1]![1]! - m[0]![1]! * v) / det, (m[0]![0]! * v - u * m[1]![0]!) / det];
    const [a0, b0] = solve(k(1) - k(0), k(2) - k(0));
    const [a1, b1] = solve(-2 * (R[1]! - R[0]!), -2 * (R[2]! - R[0]!));
    const A = a1 ** 2 + b1 ** 2 - 1, B = 2 * (a0 - x1) * a1 + 2 * (b0 - y1) * b1 - 2 * R[0]!, C = (a0 - x1) ** 2 + (b0 - y1) ** 2 - R[0]! ** 2;
    const disc = B * B - 4 * A * C;
    expect(disc).toBeGreaterThan(0);
    return [1, -1].map((sign) => {
      const rr = (-B + sign * Math.sqrt(disc)) / (2 * A);
      return pack(a0 + a1 * rr, 0, b0 + b1 * rr, 0, rr, 0);
    });
  }

  it('the 8 circles tangent to three circles are certified, real and distinct (Viète 1600)', () => {
    const certifier = prepareCertifier(system);
    const found: number[][] = [];
    for (const signs of [[1, 1, 1], [1, 1, -1], [1, -1, 1], [-1, 1, 1]]) {
      const R = circles.map((circle, i) => signs[i]! * circle[2]);
      const parameters = complexParameters(circles.flatMap((circle, i) => [circle[0], circle[1], R[i]!]));
      const points = tangentCircles(R);
      const report = certifier.certify(parameters, points);
      expect([report.certified, report.certifiedDistinct, report.certifiedReal]).toEqual([2, 2, 2]);
      for (const q of points) found.push([q[0]!, q[2]!, Math.abs(q[4]!)]);
    }
    // as circles (centre, |radius|) the 8 are pairwise different
    for (let i = 0; i < 8; i++) for (let j = i + 1; j < 8; j++) {
      expect(Math.max(...found[i]!.map((v, k) => Math.abs(v - found[j]![k]!)))).toBeGreaterThan(1e-6);
    }
  });
});
