import { describe, expect, it } from 'vitest';
import { homogeneousExponents } from '../../../../generators/problems/shared/homogeneous-monomials.ts';
import { restrictionMatrix } from '../../../../generators/problems/shared/restriction-matrix.ts';
import { nearestFormThroughLine } from '../../../../generators/problems/shared/forms-through-line.ts';
import { createRandom } from '../../../../src/engine/index.ts';

type C = [number, number];
const times = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const plus = (a: C, b: C): C => [a[0] + b[0], a[1] + b[1]];

/** Σ c_m xᵉ at a complex point (direct evaluation, the reference). */
function formAt(exponents: number[][], c: Float64Array, x: C[]): C {
  return exponents.reduce<C>((s, e, m) => plus(s, e.reduce<C>((t, k, i) => { for (let j = 0; j < k; j++) t = times(t, x[i]!); return t; }, [c[2 * m]!, c[2 * m + 1]!])), [0, 0]);
}

function randomVector(n: number, seed: number): Float64Array {
  const random = createRandom(seed), out = new Float64Array(2 * n);
  for (let i = 0; i < n; i++) random.gaussianComplex(out, 2 * i);
  return out;
}

// Restricting a form of degree d to p + s·q gives a polynomial of degree d in s (common practice, no source); the
// matrix is checked by evaluating the form directly at points of the line.
describe('the restriction of a form to a line', () => {
  it.each([[3, 4, 1], [4, 3, 2], [5, 5, 3]])('in %i variables of degree %i (seed %i): Σ_k s^k (A c)_k equals F(p + s q)', (n, d, seed) => {
    const exponents = homogeneousExponents(n, d);
    const p = randomVector(n, seed), q = randomVector(n, seed + 10), c = randomVector(exponents.length, seed + 20);
    const a = restrictionMatrix(exponents, p, q);
    const columns = exponents.length;
    for (const s of [[0.3, -0.2], [-1.1, 0.7]] as C[]) {
      let total: C = [0, 0], power: C = [1, 0];
      for (let k = 0; k <= d; k++) {
        let row: C = [0, 0];
        for (let m = 0; m < columns; m++) row = plus(row, times([a[2 * (k * columns + m)]!, a[2 * (k * columns + m) + 1]!], [c[2 * m]!, c[2 * m + 1]!]));
        total = plus(total, times(power, row));
        power = times(power, s);
      }
      const x = Array.from({ length: n }, (_, i): C => plus([p[2 * i]!, p[2 * i + 1]!], times(s, [q[2 * i]!, q[2 * i + 1]!])));
      const direct = formAt(exponents, c, x);
      expect(Math.hypot(total[0] - direct[0], total[1] - direct[1])).toBeLessThan(1e-10 * (1 + Math.hypot(...direct)));
    }
  });
});

describe('the nearest form containing a line', () => {
  it.each([[4, 3, 5], [5, 5, 6]])('in %i variables of degree %i (seed %i): vanishes on the line and moves the form least', (n, d, seed) => {
    const exponents = homogeneousExponents(n, d);
    const p = randomVector(n, seed), q = randomVector(n, seed + 10), c = randomVector(exponents.length, seed + 20);
    const a = restrictionMatrix(exponents, p, q);
    const through = nearestFormThroughLine(c, a, d + 1);
    for (const s of [[0.4, 0.1], [-2, 0.5], [0, 0]] as C[]) {
      const x = Array.from({ length: n }, (_, i): C => plus([p[2 * i]!, p[2 * i + 1]!], times(s, [q[2 * i]!, q[2 * i + 1]!])));
      expect(Math.hypot(...formAt(exponents, through, x))).toBeLessThan(1e-9 * Math.hypot(...formAt(exponents, c, x)) + 1e-12);
    }
    // The correction is orthogonal to the forms through the line: moving further along it only grows the distance,
    // so the correction is no longer than for any other member, e.g. the one built from a different start.
    const other = nearestFormThroughLine(randomVector(exponents.length, seed + 30), a, d + 1);
    const distance = (f: Float64Array) => Math.hypot(...f.map((v, i) => v - c[i]!));
    expect(distance(through)).toBeLessThanOrEqual(distance(other));
  });
});
