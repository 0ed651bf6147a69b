import { describe, expect, it } from 'vitest';
import { invertComplex, multiplyComplex } from '../../../src/engine/certify/complex-inverse.ts';
import { createRandom } from '../../../src/engine/random.ts';

// Reference: the defining identity A·A⁻¹ = I (checked column by column in floating point).
describe('approximate complex inverse', () => {
  it.each([[1], [3], [16]])('inverts a random %s×%s complex matrix to working accuracy', (n) => {
    const random = createRandom(n);
    const a = Float64Array.from({ length: 2 * n * n }, () => random.normal());
    const inverse = new Float64Array(2 * n * n);
    expect(invertComplex(a.slice(), n, inverse)).toBe(true);
    const column = new Float64Array(2 * n), product = new Float64Array(2 * n);
    for (let j = 0; j < n; j++) {
      for (let i = 0; i < n; i++) { column[2 * i] = inverse[2 * (i * n + j)]!; column[2 * i + 1] = inverse[2 * (i * n + j) + 1]!; }
      multiplyComplex(a, column, n, product);
      for (let i = 0; i < n; i++) {
        expect(product[2 * i]).toBeCloseTo(i === j ? 1 : 0, 10);
        expect(product[2 * i + 1]).toBeCloseTo(0, 10);
      }
    }
  });

  it.each([
    ['a zero matrix', [0, 0, 0, 0, 0, 0, 0, 0]],
    ['a matrix whose second row is twice the first', [1, 0, 2, 0, 2, 0, 4, 0]],
    ['a matrix with a NaN entry', [NaN, 0, 0, 0, 0, 0, 1, 0]],
  ])('reports %s as singular', (_name, entries) => {
    expect(invertComplex(Float64Array.from(entries), 2, new Float64Array(8))).toBe(false);
  });
});
