import { describe, expect, it } from 'vitest';
import { describeGroup, EXACT_ORDER_LIMIT } from '../../../src/engine/galois/describe-group.ts';
import { andThen } from '../../../src/engine/galois/permutation.ts';
import { alternating, cycle, psl2, symmetric } from './groups.ts';

describe('describeGroup', () => {
  it.each([
    ['S_9', symmetric(9), 9, 'symmetric', '362880'],
    ['A_9', alternating(9), 9, 'alternating', '181440'],
    ['PSL(2,7)', psl2(7, 3), 8, 'order', '168'],
    ['two disjoint cycles', [andThen(cycle(5, 0, 1), cycle(5, 2, 3, 4))], 5, 'intransitive', '6'],
  ])('%s: verdict %s, order %s', (_, gens, n, verdict, order) => {
    const d = describeGroup(gens, n);
    expect(d.verdict).toBe(verdict);
    expect(d.order).toBe(order);
  });
  it('above the exact-order limit it decides S_n by Jordan\'s test alone', () => {
    const n = EXACT_ORDER_LIMIT + 36;
    const d = describeGroup(symmetric(n), n);
    expect(d.order).toBeNull();
    expect(d.verdict).toBe('symmetric');
  });
  it('above the limit, a group without a Jordan witness stays undecided', () => {
    const n = EXACT_ORDER_LIMIT + 1;
    const d = describeGroup([cycle(n, ...Array.from({ length: n }, (_, i) => i))], n);
    expect(d.verdict).toBe('undecided');
  });
  it.each([2, 9, EXACT_ORDER_LIMIT + 1])('with no element at all (every loop broken) on %i points, claims nothing: undecided, not intransitive', (n) => {
    expect(describeGroup([], n).verdict).toBe('undecided');
  });
  it('counts cycle types, most frequent first', () => {
    const t = cycle(6, 0, 1);
    const d = describeGroup([t, t, cycle(6, 0, 1, 2, 3, 4, 5)], 6);
    expect(d.cycleTypes).toEqual([{ type: '2', count: 2 }, { type: '6', count: 1 }]);
  });
});
