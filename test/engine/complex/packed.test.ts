import { describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import { axpy, cdiv, distInf, dotc, dotu, matVec, normInf, norm2, scale } from '../../../src/engine/complex/packed.ts';

// Reference values come from complex.js (a general-purpose complex-number library) or from hand arithmetic.
const pack = (...zs: [number, number][]): Float64Array => new Float64Array(zs.flat());

describe('packed complex kernels', () => {
  it('normInf is the largest modulus (|3 + 4i| = 5, hand arithmetic)', () => {
    expect(normInf(pack([1, 1], [3, 4], [-2, 0]))).toBe(5);
  });
  it('norm2 is the Euclidean norm over re and im parts', () => {
    expect(norm2(pack([1, 2], [2, 4]))).toBeCloseTo(5, 14);
  });
  it('distInf measures the largest entrywise distance', () => {
    expect(distInf(pack([0, 0], [1, 1]), pack([3, 4], [1, 1]))).toBe(5);
  });
  it('axpy and scale agree with complex.js products', () => {
    const x = pack([1, 2], [-3, 0.5]), y = pack([0.25, -1], [2, 2]);
    const out = new Float64Array(4);
    axpy(out, x, 0.5, -1.5, y);
    const a = new Complex(0.5, -1.5);
    [0, 1].forEach((k) => {
      const ref = new Complex(x[2 * k]!, x[2 * k + 1]!).add(a.mul(new Complex(y[2 * k]!, y[2 * k + 1]!)));
      expect(out[2 * k]).toBeCloseTo(ref.re, 14);
      expect(out[2 * k + 1]).toBeCloseTo(ref.im, 14);
    });
    scale(out, 0, 1, x);
    expect(Array.from(out)).toEqual([-2, 1, -0.5, -3]); // i·(1 + 2i) = −2 + i, i·(−3 + 0.5i) = −0.5 − 3i
  });
  it('dotc conjugates its first argument: ⟨a, a⟩ = ‖a‖²', () => {
    const a = pack([1, 2], [3, -4]);
    const out = new Float64Array(2);
    dotc(out, a, a);
    expect(out[0]).toBe(30);
    expect(out[1]).toBe(0);
  });
  it('dotu does not conjugate and reads and writes at the given offsets (complex.js reference)', () => {
    const a = pack([9, 9], [1, 2], [3, -4]), b = pack([2, -1], [0.5, 3]);
    const out = new Float64Array(4);
    dotu(out, a, b, 2, 2, 0, 2);
    const ref = new Complex(1, 2).mul(new Complex(2, -1)).add(new Complex(3, -4).mul(new Complex(0.5, 3)));
    expect(out[0]).toBe(0);
    expect(out[2]).toBeCloseTo(ref.re, 14);
    expect(out[3]).toBeCloseTo(ref.im, 14);
  });
  it('matVec multiplies a packed row-major matrix by a vector (complex.js reference)', () => {
    const m = pack([1, 1], [2, 0], [0, -1], [3, 2]);
    const v = pack([1, -1], [0.5, 2]);
    const out = new Float64Array(4);
    matVec(out, m, v, 2, 2);
    const c = (k: number, arr: Float64Array) => new Complex(arr[2 * k]!, arr[2 * k + 1]!);
    const r0 = c(0, m).mul(c(0, v)).add(c(1, m).mul(c(1, v)));
    const r1 = c(2, m).mul(c(0, v)).add(c(3, m).mul(c(1, v)));
    expect(out[0]).toBeCloseTo(r0.re, 14);
    expect(out[1]).toBeCloseTo(r0.im, 14);
    expect(out[2]).toBeCloseTo(r1.re, 14);
    expect(out[3]).toBeCloseTo(r1.im, 14);
  });
  it.each([[1, 2, 3, 4], [1e-300, 1, 1e-300, 3], [5, -7, 1e200, 1e199], [2, 0, 0, -2]])('cdiv (%s + %si)/(%s + %si) matches complex.js', (ar, ai, br, bi) => {
    const out = new Float64Array(2);
    cdiv(out, 0, ar, ai, br, bi);
    const ref = new Complex(ar, ai).div(new Complex(br, bi));
    expect(Math.abs(out[0]! - ref.re)).toBeLessThanOrEqual(1e-15 * Math.max(Math.abs(ref.re), Math.abs(ref.im)));
    expect(Math.abs(out[1]! - ref.im)).toBeLessThanOrEqual(1e-15 * Math.max(Math.abs(ref.re), Math.abs(ref.im)));
  });
});
