import { describe, expect, it } from 'vitest';
import { cycleType, cycleTypeText, firstMoved, identity, inverse, isIdentity, isOdd, isPermutation, andThen } from '../../../src/engine/galois/permutation.ts';
import { cycle } from './groups.ts';

describe('permutations as image arrays', () => {
  it('compose left to right: first a, then b', () => {
    const a = cycle(3, 0, 1), b = cycle(3, 1, 2);
    expect([...andThen(a, b)]).toEqual([2, 0, 1]); // 0 → 1 → 2, 1 → 0, 2 → 1
  });
  it('a permutation times its inverse is the identity', () => {
    const p = cycle(7, 0, 3, 6, 2);
    expect(isIdentity(andThen(p, inverse(p)))).toBe(true);
    expect(isIdentity(identity(4))).toBe(true);
  });
  it.each([
    [cycle(6, 0, 1, 2), [3, 1, 1, 1], '3', false],
    [andThen(cycle(6, 0, 1, 2), cycle(6, 3, 4)), [3, 2, 1], '3·2', true],
    [andThen(cycle(8, 0, 1), cycle(8, 2, 3)), [2, 2, 1, 1, 1, 1], '2²', false],
    [identity(3), [1, 1, 1], '1', false],
  ])('cycle type, its text and parity', (p, type, text, odd) => {
    expect(cycleType(p)).toEqual(type);
    expect(cycleTypeText(cycleType(p))).toBe(text);
    expect(isOdd(p)).toBe(odd);
  });
  it('finds the first moved point', () => {
    expect(firstMoved(cycle(5, 2, 4))).toBe(2);
    expect(firstMoved(identity(5))).toBe(-1);
  });
  it.each([
    [[1, 0, 2], true],
    [[1, 1, 2], false],
    [[0, 3, 1], false],
    [[0, -1, 1], false],
  ])('recognises a permutation: %j → %s', (p, ok) => {
    expect(isPermutation(p)).toBe(ok);
  });
});
