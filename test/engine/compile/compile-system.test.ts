import { describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import type { ExprNode } from '../../../src/engine/expr/node.ts';
import { add, constant, mul, pow } from '../../../src/engine/expr/build.ts';
import { a, sampleSystem, shared, x0, x1, x2 } from './sample-system.ts';
import { compileSystem, compiledFromSource } from '../../../src/engine/compile/compile-system.ts';
import { createRandom } from '../../../src/engine/random.ts';

// Reference: a direct tree-walking evaluation of the graph with complex.js (a general-purpose library).
function direct(node: ExprNode, x: Float64Array, p: Float64Array): Complex {
  switch (node.kind) {
    case 'const': return new Complex(node.re, node.im);
    case 'unknown': return new Complex(x[2 * node.index]!, x[2 * node.index + 1]!);
    case 'param': return new Complex(p[2 * node.index]!, p[2 * node.index + 1]!);
    case 'add': return node.terms.reduce((s, t) => s.add(direct(t, x, p)), new Complex(0, 0));
    case 'mul': return node.factors.reduce((s, f) => s.mul(direct(f, x, p)), new Complex(1, 0));
    case 'neg': return direct(node.arg, x, p).neg();
    case 'pow': {
      let r = new Complex(1, 0);
      const b = direct(node.base, x, p);
      for (let k = 0; k < node.exponent; k++) r = r.mul(b);
      return r;
    }
  }
}

const system = sampleSystem;

const point = (seed: number, n: number): Float64Array => {
  const r = createRandom(seed);
  const v = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) r.gaussianComplex(v, 2 * i);
  return v;
};

describe('compileSystem', () => {
  const compiled = compileSystem(system);
  const v = new Float64Array(6), jx = new Float64Array(18), jp = new Float64Array(12);

  it.each([1, 2, 3, 4, 5])('values agree with direct complex.js evaluation at random point %i', (seed) => {
    const x = point(seed, 3), p = point(seed + 50, 2);
    compiled.evaluate(x, p, v, jx, jp);
    system.equations.forEach((e, i) => {
      const ref = direct(e, x, p);
      expect(Math.abs(v[2 * i]! - ref.re)).toBeLessThan(1e-11 * (1 + ref.abs()));
      expect(Math.abs(v[2 * i + 1]! - ref.im)).toBeLessThan(1e-11 * (1 + ref.abs()));
    });
  });

  it.each([6, 7, 8])('Jacobians agree with central finite differences at random point %i (error O(h²), h = 1e-5)', (seed) => {
    const x = point(seed, 3), p = point(seed + 50, 2);
    compiled.evaluate(x, p, v, jx, jp);
    const h = 1e-5;
    const check = (vec: Float64Array, k: number, jac: Float64Array, cols: number): void => {
      const plus = Float64Array.from(vec), minus = Float64Array.from(vec);
      plus[2 * k] = plus[2 * k]! + h;
      minus[2 * k] = minus[2 * k]! - h;
      const vp = new Float64Array(6), vm = new Float64Array(6);
      const isX = vec === x;
      compiled.evaluate(isX ? plus : x, isX ? p : plus, vp, null, null);
      compiled.evaluate(isX ? minus : x, isX ? p : minus, vm, null, null);
      for (let i = 0; i < 3; i++) {
        // holomorphic: the derivative along the real direction is the complex derivative
        const fdRe = (vp[2 * i]! - vm[2 * i]!) / (2 * h), fdIm = (vp[2 * i + 1]! - vm[2 * i + 1]!) / (2 * h);
        const q = 2 * (i * cols + k);
        const scale = 1 + Math.hypot(fdRe, fdIm);
        expect(Math.abs(jac[q]! - fdRe)).toBeLessThan(1e-5 * scale);
        expect(Math.abs(jac[q + 1]! - fdIm)).toBeLessThan(1e-5 * scale);
      }
    };
    for (let k = 0; k < 3; k++) check(x, k, jx, 3);
    for (let k = 0; k < 2; k++) check(p, k, jp, 2);
  });

  it('rebuilds bit-identically from its source text', () => {
    const again = compiledFromSource(compiled.source, compiled);
    const x = point(9, 3), p = point(10, 2);
    const v2 = new Float64Array(6), jx2 = new Float64Array(18), jp2 = new Float64Array(12);
    compiled.evaluate(x, p, v, jx, jp);
    again.evaluate(x, p, v2, jx2, jp2);
    expect(Array.from(v2)).toEqual(Array.from(v));
    expect(Array.from(jx2)).toEqual(Array.from(jx));
    expect(Array.from(jp2)).toEqual(Array.from(jp));
  });

  it('shares identical subtrees built as separate objects (hash-consing)', () => {
    const twice = (f: () => ExprNode) => compileSystem({ unknowns: ['x', 'y', 'z'], parameters: ['a', 'b'], equations: [add(f(), f())] });
    const once = compileSystem({ unknowns: ['x', 'y', 'z'], parameters: ['a', 'b'], equations: [add(shared, shared)] });
    const fresh = twice(() => add(mul(a, x0, x1), pow(x2, 3), constant(0.5, -2)));
    expect(fresh.program!.instructions.length).toBe(once.program!.instructions.length);
  });

  it('fills values only when jx is null', () => {
    const x = point(11, 3), p = point(12, 2);
    const marker = new Float64Array(18).fill(7);
    compiled.evaluate(x, p, v, null, null);
    expect(Array.from(marker).every((m) => m === 7)).toBe(true);
    expect(v.every(Number.isFinite)).toBe(true);
  });

  it('names the equation when an unknown index is out of range', () => {
    expect(() => compileSystem({ unknowns: ['x'], parameters: [], equations: [x0, mul(x0, x2)] })).toThrow(/equation 1: unknown index 2/);
  });
});
