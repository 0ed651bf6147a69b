import { describe, expect, it } from 'vitest';
import { createTape, type TapeInstruction } from '../../../src/engine/compile/tape.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { add, mul, param, pow, unknown } from '../../../src/engine/expr/build.ts';
import type { ExprNode, PolynomialSystem } from '../../../src/engine/expr/node.ts';
import { generateDoubleDoubleValuesSource } from '../../../src/engine/dd/values-codegen.ts';
import { compileValuesInDoubleDouble } from '../../../src/engine/dd/compile-values.ts';
import { createRandom, type RandomSource } from '../../../src/engine/random.ts';
import { finite } from '../interval/exact-rational.ts';
import { approximate, randomPair } from './exact-dd.ts';
import { exactTapeValues, partError, type ExactTapeValue } from './exact-tape.ts';
import { sampleSystem } from '../compile/sample-system.ts';

// Reference: the same tape evaluated exactly in BigInt rationals (exact-tape.ts), with a running error bound built
// from the per-operation constants of values-codegen.ts (3u² + 13u³ per sum, after Joldes–Muller–Popescu 2017, read
// second-hand; 14u² per two-product sum, our derivation in dd-product-sum.ts), u = 2⁻⁵³.

interface RandomProgram { instructions: readonly TapeInstruction[]; values: number[]; n: number; np: number }

/**
 * A random straight-line program: n unknowns, np parameters, a few constants, then `size` operations on earlier
 * values (degree kept ≤ 12 so exact rationals stay small). `benign`: only + and ×, leaves with real part in [1, 2]
 * and imaginary part in [−0.05, 0.05], so no value cancels (well-conditioned); otherwise −, negation and Gaussian
 * complex constants too.
 */
function randomProgram(random: RandomSource, size: number, benign: boolean): RandomProgram {
  const tape = createTape();
  const n = 3, np = 2;
  const ids: number[] = [], degree = new Map<number, number>();
  const leaf = (id: number, d: number): void => { ids.push(id); degree.set(id, d); };
  for (let j = 0; j < n; j++) leaf(tape.unknown(j), 1);
  for (let k = 0; k < np; k++) leaf(tape.parameter(k), 0);
  const value = (): [number, number] => (benign ? [1 + random.next(), (random.next() - 0.5) * 0.1] : [random.normal(), random.next() < 0.3 ? 0 : random.normal()]);
  for (let k = 0; k < 3; k++) leaf(tape.constant(...value()), 0);
  if (!benign) leaf(tape.constant(Math.floor(random.next() * 20) - 10, 0), 0);
  while (ids.length < size) {
    const pick = (): number => ids[ids.length - 1 - Math.floor(random.next() * Math.min(ids.length, 8))]!;
    const a = pick(), b = pick();
    const u = random.next();
    const ops = benign ? ['add', 'mul'] : ['add', 'sub', 'mul', 'neg'];
    const op = ops[Math.floor(u * ops.length)]!;
    const d = op === 'mul' ? degree.get(a)! + degree.get(b)! : Math.max(degree.get(a)!, degree.get(b)!);
    if (d > 12) continue;
    const id = op === 'add' ? tape.add(a, b) : op === 'sub' ? tape.sub(a, b) : op === 'mul' ? tape.mul(a, b) : tape.neg(a);
    if (!degree.has(id)) leaf(id, d);
  }
  const values = ids.slice(-3);
  return { instructions: tape.instructions, values, n, np };
}

function randomInputs(random: RandomSource, n: number, np: number, benign: boolean): { xhi: Float64Array; xlo: Float64Array; p: Float64Array } {
  const xhi = new Float64Array(2 * n), xlo = new Float64Array(2 * n), p = new Float64Array(2 * np);
  for (let j = 0; j < 2 * n; j++) {
    const [h, l] = randomPair(random, -1, 0);
    [xhi[j], xlo[j]] = benign ? (j % 2 === 0 ? [1 + Math.abs(h) / 2, l / 2] : [h / 20, l / 20]) : [h, l];
  }
  for (let k = 0; k < 2 * np; k++) p[k] = benign ? (k % 2 === 0 ? 1 + random.next() : (random.next() - 0.5) * 0.1) : random.normal();
  return { xhi, xlo, p };
}

/** Evaluates a random program at 5 random inputs and hands each output's error and exact value to `check`. */
function checkRandomProgram(seed: number, benign: boolean, check: (errorRe: number, errorIm: number, exact: ExactTapeValue) => void): void {
  const random = createRandom(seed);
  const program = randomProgram(random, 45, benign);
  const { evaluate } = compileValuesInDoubleDouble({ instructions: program.instructions, outputs: { values: program.values } });
  const v = new Float64Array(6), vlo = new Float64Array(6);
  for (let trial = 0; trial < 5; trial++) {
    const { xhi, xlo, p } = randomInputs(random, program.n, program.np, benign);
    evaluate(xhi, xlo, p, v, vlo);
    const exact = exactTapeValues(program.instructions, xhi, xlo, p);
    program.values.forEach((id, k) => {
      const e = exact[id]!;
      check(partError(v[2 * k]!, vlo[2 * k]!, e.re), partError(v[2 * k + 1]!, vlo[2 * k + 1]!, e.im), e);
    });
  }
}

describe('generateDoubleDoubleValuesSource', () => {
  it.each([1, 2, 3, 4, 5, 6, 7, 8])('random program %i: every output part within the running error bound of the exact tape value', (seed) => {
    checkRandomProgram(700 + seed, false, (errorRe, errorIm, e) => {
      expect(errorRe).toBeLessThanOrEqual(e.boundRe);
      expect(errorIm).toBeLessThanOrEqual(e.boundIm);
    });
  });

  // observed worst over these programs: 9.4e-31; the running bound guarantees ≤ 6.4e-29 relative here
  it.each([1, 2, 3, 4, 5, 6])('well-conditioned random program %i (no cancellation): relative error ≤ 1e-29 and within the running bound', (seed) => {
    checkRandomProgram(800 + seed, true, (errorRe, errorIm, e) => {
      const error = Math.hypot(errorRe, errorIm);
      expect(error).toBeLessThanOrEqual(Math.hypot(e.boundRe, e.boundIm));
      expect(error).toBeLessThanOrEqual(1e-29 * Math.hypot(approximate(e.re), approximate(e.im)));
    });
  });
});

// (x − 1)⁶ expanded (binomial coefficients): near x = 1 the terms (size up to 20) cancel to (x − 1)⁶.
const xs = unknown('x', 0);
const sextic = add(pow(xs, 6), mul(-6, pow(xs, 5)), mul(15, pow(xs, 4)), mul(-20, pow(xs, 3)), mul(15, pow(xs, 2)), mul(-6, xs), 1);
const sexticSystem: PolynomialSystem = { unknowns: ['x'], parameters: [], equations: [sextic] };

describe('catastrophic cancellation: (x − 1)^6 expanded', () => {
  const compiled = compileSystem(sexticSystem);
  const dd = compileValuesInDoubleDouble(compiled.program!);
  const exactValue = (x: number): number => approximate({ n: (finite(x).n - finite(x).d) ** 6n, d: finite(x).d ** 6n });

  it.each([
    ['1 + 2^-8 + 2^-40', 1 + 2 ** -8 + 2 ** -40],
    ['1 − 3·2^-10 + 2^-45', 1 - 3 * 2 ** -10 + 2 ** -45],
    ['1 + 2^-12 + 2^-50', 1 + 2 ** -12 + 2 ** -50],
  ])('at x = %s double is off by more than 10% while double-double is within its bound and 1e-9 relative', (_, x) => {
    const xhi = Float64Array.of(x, 0), xlo = new Float64Array(2), v = new Float64Array(2), vlo = new Float64Array(2), vd = new Float64Array(2);
    compiled.evaluate(xhi, new Float64Array(0), vd, null, null);
    dd.evaluate(xhi, xlo, new Float64Array(0), v, vlo);
    const exact = exactValue(x);
    const bound = exactTapeValues(compiled.program!.instructions, xhi, xlo, new Float64Array(0))[compiled.program!.outputs.values[0]!]!;
    expect(Math.abs(vd[0]! - exact)).toBeGreaterThan(0.1 * exact);
    expect(partError(v[0]!, vlo[0]!, bound.re)).toBeLessThanOrEqual(bound.boundRe);
    expect(Math.abs(v[0]! - exact)).toBeLessThanOrEqual(1e-9 * exact);
  });

  it('at x = 1 + 2^-20 the value 2^-120 lies below double-double resolution of the terms: the error stays within the bound, not within 1% of the value', () => {
    const x = 1 + 2 ** -20;
    const xhi = Float64Array.of(x, 0), xlo = new Float64Array(2), v = new Float64Array(2), vlo = new Float64Array(2);
    dd.evaluate(xhi, xlo, new Float64Array(0), v, vlo);
    const bound = exactTapeValues(compiled.program!.instructions, xhi, xlo, new Float64Array(0))[compiled.program!.outputs.values[0]!]!;
    expect(partError(v[0]!, vlo[0]!, bound.re)).toBeLessThanOrEqual(bound.boundRe);
    expect(bound.boundRe).toBeGreaterThan(2 ** -120);
  });
});

describe('agreement with the double evaluator', () => {
  const compiled = compileSystem(sampleSystem);
  const dd = compileValuesInDoubleDouble(compiled.program!);
  it.each([1, 2, 3, 4, 5, 6])('rounded double-double values match double values to 1e-12 (relative to 1 + |v|) at random point %i', (seed) => {
    const random = createRandom(900 + seed);
    const x = new Float64Array(6), p = new Float64Array(4);
    for (let j = 0; j < 3; j++) random.gaussianComplex(x, 2 * j);
    for (let k = 0; k < 2; k++) random.gaussianComplex(p, 2 * k);
    const vd = new Float64Array(6), v = new Float64Array(6);
    compiled.evaluate(x, p, vd, null, null);
    dd.evaluate(x, new Float64Array(6), p, v, null);
    for (let i = 0; i < 6; i++) expect(Math.abs(v[i]! - vd[i]!)).toBeLessThanOrEqual(1e-12 * (1 + Math.abs(vd[i]!)));
  });
});

describe('cheaper forms', () => {
  const multiplications = (equation: ExprNode): number => {
    const c = compileSystem({ unknowns: ['x', 'y'], parameters: ['a'], equations: [equation] });
    return (generateDoubleDoubleValuesSource(c.program!.instructions, c.program!.outputs.values).match(/\*/g) ?? []).length;
  };
  const [u, w, a] = [unknown('x', 0), unknown('y', 1), param('a', 0)];
  it.each([
    ['a small integer constant times x', mul(6, u)],
    ['a 53-bit real constant times x', mul(0.1, u)],
    ['a parameter times x', mul(a, u)],
    ['x squared', mul(u, u)],
  ])('%s needs fewer multiplications than x·y', (_, equation) => {
    expect(multiplications(equation)).toBeLessThan(multiplications(mul(u, w)));
  });
  it('adding a real constant costs less than adding two unknowns', () => {
    const lines = (e: ExprNode): number => {
      const c = compileSystem({ unknowns: ['x', 'y'], parameters: [], equations: [e] });
      return generateDoubleDoubleValuesSource(c.program!.instructions, c.program!.outputs.values).split('\n').length;
    };
    expect(lines(add(2.5, u))).toBeLessThan(lines(add(w, u)));
  });
});
