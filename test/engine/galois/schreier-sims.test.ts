import { describe, expect, it } from 'vitest';
import { groupOrder, stabiliserChain } from '../../../src/engine/galois/schreier-sims.ts';
import { agl1, alternating, cycle, dihedral, pgl2, psl2, symmetric, wreathS2S3 } from './groups.ts';

const factorial = (n: number): bigint => (n <= 1 ? 1n : BigInt(n) * factorial(n - 1));

describe('groupOrder (Schreier–Sims) on groups with textbook orders (Dixon–Mortimer, Permutation Groups, 1996)', () => {
  it.each([3, 4, 5, 6, 8, 10, 13])('S_%i has order n!', (n) => {
    expect(groupOrder(symmetric(n), n)).toBe(factorial(n));
  });
  it.each([4, 5, 6, 7, 9, 12])('A_%i has order n!/2', (n) => {
    expect(groupOrder(alternating(n), n)).toBe(factorial(n) / 2n);
  });
  it.each([5, 6, 12])('the dihedral group of the %i-gon has order 2n', (n) => {
    expect(groupOrder(dihedral(n), n)).toBe(BigInt(2 * n));
  });
  it.each([
    [5, 2, 120n, 60n],
    [7, 3, 336n, 168n],
    [11, 2, 1320n, 660n],
    [13, 2, 2184n, 1092n],
  ])('PGL(2, %i) and PSL(2, %i) on the projective line have orders p(p²−1) and p(p²−1)/2', (p, g, full, special) => {
    expect(groupOrder(pgl2(p, g), p + 1)).toBe(full);
    expect(groupOrder(psl2(p, g), p + 1)).toBe(special);
  });
  it.each([[7, 3, 42n], [11, 2, 110n]])('AGL(1, %i) has order p(p − 1)', (p, g, order) => {
    expect(groupOrder(agl1(p, g), p)).toBe(order);
  });
  it('the wreath product S₂ ≀ S₃ has order 2³·3! = 48', () => {
    expect(groupOrder(wreathS2S3, 6)).toBe(48n);
  });
  it('the Mathieu group M₁₁ from (1 … 11) and (3 7 11 8)(4 10 5 6) has order 7920 (generators from memory)', () => {
    const m = (...c: number[][]): Int32Array => {
      const p = Int32Array.from({ length: 11 }, (_, i) => i);
      for (const cyc of c) cyc.forEach((x, i) => { p[x - 1] = cyc[(i + 1) % cyc.length]! - 1; });
      return p;
    };
    expect(groupOrder([m([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11]), m([3, 7, 11, 8], [4, 10, 5, 6])], 11)).toBe(7920n);
  });
  it('the trivial group and a cyclic group: order 1 and the cycle length', () => {
    expect(groupOrder([], 5)).toBe(1n);
    expect(groupOrder([cycle(9, 0, 3, 5, 7)], 9)).toBe(4n);
  });
  it('a chain\'s basic orbits multiply to the order and its base has at most n − 1 points', () => {
    const chain = stabiliserChain(psl2(7, 3), 8);
    expect(chain.orbitLengths.reduce((p, l) => p * l, 1)).toBe(168);
    expect(chain.base.length).toBeLessThanOrEqual(7);
  });
  it('rejects a generator of the wrong degree', () => {
    expect(() => groupOrder([cycle(4, 0, 1)], 5)).toThrow(RangeError);
  });
});
