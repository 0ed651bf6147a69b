import { describe, expect, it } from 'vitest';
import { add, constant, mul, neg, param, pow, sub, unknown } from '../../../src/engine/expr/build.ts';
import type { ExprNode, PolynomialSystem } from '../../../src/engine/expr/node.ts';
import { compileCertifiableSystem } from '../../../src/engine/certify/certifiable-system.ts';
import { createRandom, type RandomSource } from '../../../src/engine/random.ts';
import { inside } from '../interval/exact-rational.ts';
import { exactEvaluate } from './exact-evaluate.ts';

// Reference: exact rational evaluation of the same graph (BigInt fractions, forward-mode exact derivatives).
// Interval evaluation must enclose the exact value and Jacobian at every exact point of the box.
const x = [0, 1, 2].map((i) => unknown(`x${i}`, i));
const p = [0, 1].map((i) => param(`p${i}`, i));

function randomPolynomial(random: RandomSource, depth: number): ExprNode {
  const pick = random.next();
  if (depth === 0 || pick < 0.25) {
    const leaf = random.next();
    if (leaf < 0.5) return x[Math.floor(random.next() * 3)]!;
    if (leaf < 0.75) return p[Math.floor(random.next() * 2)]!;
    return constant(random.normal(), random.next() < 0.5 ? 0 : random.normal());
  }
  if (pick < 0.5) return add(randomPolynomial(random, depth - 1), randomPolynomial(random, depth - 1), randomPolynomial(random, depth - 1));
  if (pick < 0.7) return mul(randomPolynomial(random, depth - 1), randomPolynomial(random, depth - 1));
  if (pick < 0.8) return neg(randomPolynomial(random, depth - 1));
  if (pick < 0.9) return sub(randomPolynomial(random, depth - 1), randomPolynomial(random, depth - 1));
  return pow(randomPolynomial(random, depth - 1), 1 + Math.floor(random.next() * 3));
}

describe('compiled interval evaluation', () => {
  it('encloses exact values and exact Jacobians of 80 random systems at exact points of random boxes', () => {
    const random = createRandom(2023);
    for (let trial = 0; trial < 80; trial++) {
      const system: PolynomialSystem = { unknowns: ['x0', 'x1', 'x2'], parameters: ['p0', 'p1'], equations: [0, 1, 2].map(() => randomPolynomial(random, 4)) };
      const compiled = compileCertifiableSystem(system);
      const parameters = Float64Array.from({ length: 4 }, () => random.normal());
      compiled.setParameters(parameters);
      const box = new Float64Array(12);
      for (let k = 0; k < 6; k++) {
        const c = random.normal(), r = Math.abs(random.normal()) * 10 ** -(1 + Math.floor(random.next() * 8));
        box[2 * k] = c - r; box[2 * k + 1] = c + r;
      }
      const values = new Float64Array(12), jacobian = new Float64Array(36);
      compiled.intervalJacobian(box, values, jacobian);
      for (let sample = 0; sample < 3; sample++) {
        const point = Float64Array.from({ length: 6 }, (_, k) => {
          const u = random.next();
          return u < 0.2 ? box[2 * k]! : u < 0.4 ? box[2 * k + 1]! : box[2 * k]! + (box[2 * k + 1]! - box[2 * k]!) * random.next();
        });
        system.equations.forEach((equation, i) => {
          const exact = exactEvaluate(equation, point, parameters);
          expect(inside(exact.re, values[4 * i]!, values[4 * i + 1]!) && inside(exact.im, values[4 * i + 2]!, values[4 * i + 3]!)).toBe(true);
          for (let j = 0; j < 3; j++) {
            const o = 4 * (3 * i + j);
            expect(inside(exact.dre[j]!, jacobian[o]!, jacobian[o + 1]!), `∂f${i}/∂x${j} real part, trial ${trial}`).toBe(true);
            expect(inside(exact.dim[j]!, jacobian[o + 2]!, jacobian[o + 3]!), `∂f${i}/∂x${j} imaginary part, trial ${trial}`).toBe(true);
          }
        });
      }
    }
  });

  it('encloses exact values at points within a few floats (exact dyadic evaluation), for 40 random systems', () => {
    const random = createRandom(1969);
    for (let trial = 0; trial < 40; trial++) {
      const system: PolynomialSystem = { unknowns: ['x0', 'x1', 'x2'], parameters: ['p0', 'p1'], equations: [0, 1, 2].map(() => randomPolynomial(random, 4)) };
      const compiled = compileCertifiableSystem(system);
      const parameters = Float64Array.from({ length: 4 }, () => random.normal());
      compiled.setParameters(parameters);
      const point = Float64Array.from({ length: 6 }, () => random.normal() * 2 ** Math.round(random.normal() * 20));
      const values = new Float64Array(12);
      compiled.exactValues(point, values);
      system.equations.forEach((equation, i) => {
        const exact = exactEvaluate(equation, point, parameters);
        expect(inside(exact.re, values[4 * i]!, values[4 * i + 1]!) && inside(exact.im, values[4 * i + 2]!, values[4 * i + 3]!)).toBe(true);
        for (const [lo, hi] of [[values[4 * i]!, values[4 * i + 1]!], [values[4 * i + 2]!, values[4 * i + 3]!]]) {
          expect(hi! - lo!).toBeLessThanOrEqual(Math.max(16 * Number.EPSILON * Math.abs(hi!), 2 ** -1070));
        }
      });
    }
  });

  it('agrees with the floating-point evaluation at a point', () => {
    const system: PolynomialSystem = { unknowns: ['x0', 'x1', 'x2'], parameters: ['p0', 'p1'], equations: [
      sub(mul(x[0]!, x[1]!), p[0]!), add(pow(x[2]!, 3), mul(constant(0, 2), x[0]!)), sub(mul(p[1]!, x[1]!, x[2]!), 1),
    ] };
    const compiled = compileCertifiableSystem(system);
    compiled.setParameters(Float64Array.from([2, 0, 0.5, -1]));
    const point = Float64Array.from([1.5, 0.25, -2, 1, 0.75, 0.5]);
    const values = new Float64Array(6), jacobian = new Float64Array(18);
    compiled.pointJacobian(point, values, jacobian);
    // f0 = x0·x1 − 2 = (1.5 + 0.25i)(−2 + i) − 2 = −5.25 + i
    expect(values[0]).toBeCloseTo(-5.25, 14);
    expect(values[1]).toBeCloseTo(1, 14);
    // ∂f1/∂x0 = 2i
    expect([jacobian[6], jacobian[7]]).toEqual([0, 2]);
    // ∂f2/∂x2 = p1·x1 = (0.5 − i)(−2 + i) = 0 + 2.5i
    expect(jacobian[16]).toBeCloseTo(0, 14);
    expect(jacobian[17]).toBeCloseTo(2.5, 14);
  });

  it.each([
    ['more equations than unknowns', { unknowns: ['x'], parameters: [], equations: [unknown('x', 0), unknown('x', 0)] }, /2 equations in 1 unknowns/],
    ['an unknown index out of range', { unknowns: ['x'], parameters: [], equations: [unknown('y', 3)] }, /index 3/],
  ] as [string, PolynomialSystem, RegExp][])('rejects %s with a clear error', (_name, system, message) => {
    expect(() => compileCertifiableSystem(system)).toThrow(message);
  });

  it('rejects parameters of the wrong length or non-finite value, naming them', () => {
    const compiled = compileCertifiableSystem({ unknowns: ['x'], parameters: ['a'], equations: [sub(unknown('x', 0), param('a', 0))] });
    expect(() => compiled.setParameters(new Float64Array(4))).toThrow(/expected 1 complex parameters/);
    expect(() => compiled.setParameters(Float64Array.from([NaN, 0]))).toThrow(/parameter a/);
  });
});
