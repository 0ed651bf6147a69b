import { describe, expect, it } from 'vitest';
import { alternatingEvidence } from '../../../src/engine/galois/alternating-test.ts';
import { isPrimitive, minimalBlock } from '../../../src/engine/galois/blocks.ts';
import { isTransitive } from '../../../src/engine/galois/orbits.ts';
import { primeCycleWitness } from '../../../src/engine/galois/prime-cycle.ts';
import { andThen } from '../../../src/engine/galois/permutation.ts';
import { alternating, cycle, dihedral, psl2, symmetric, wreathS2S3 } from './groups.ts';

describe('orbits and blocks (Atkinson, Math. Comp. 29, 1975)', () => {
  it('S₂ ≀ S₃ is transitive with blocks of size 2', () => {
    expect(isTransitive(wreathS2S3, 6)).toBe(true);
    expect(minimalBlock(wreathS2S3, 6, 0, 1)).toEqual([0, 1]);
    expect(isPrimitive(wreathS2S3, 6)).toBe(false);
  });
  it.each([
    ['S_7', symmetric(7), 7, true],
    ['PSL(2,7) on 8 points (2-transitive)', psl2(7, 3), 8, true],
    ['the dihedral group of the hexagon', dihedral(6), 6, false],
    ['the dihedral group of the pentagon (prime degree)', dihedral(5), 5, true],
  ])('%s primitive: %s', (_, gens, n, primitive) => {
    expect(isPrimitive(gens, n)).toBe(primitive);
  });
  it('two disjoint cycles are intransitive', () => {
    expect(isTransitive([andThen(cycle(5, 0, 1), cycle(5, 2, 3, 4))], 5)).toBe(false);
  });
});

describe('Jordan\'s test (Jordan 1873; Hauenstein–Rodriguez–Sottile, arXiv:1605.07806)', () => {
  it.each([
    [andThen(cycle(9, 0, 1, 2, 3, 4), cycle(9, 5, 6)), 5],
    [andThen(cycle(9, 0, 1, 2), cycle(9, 3, 4, 5)), null], // two 3-cycles: no power is a single 3-cycle
    [andThen(cycle(9, 0, 1, 2), cycle(9, 3, 4, 5, 6, 7, 8)), null], // the 6-cycle's length is divisible by 3
    [andThen(cycle(10, 0, 1, 2, 3, 4, 5, 6), cycle(10, 7, 8)), 7], // 7 ≤ 10 − 3
    [cycle(8, 0, 1, 2, 3, 4, 5, 6), null], // 7 > 8 − 3
  ])('prime-cycle witness of element %#', (g, p) => {
    expect(primeCycleWitness(g)).toBe(p);
  });
  it('S_n is proven to contain A_n and to have an odd element', () => {
    const e = alternatingEvidence(symmetric(12), 12);
    expect(e.containsAlternating).toBe(true);
    expect(e.oddElement).not.toBeNull();
  });
  it('A_n is proven to contain A_n with no odd element seen', () => {
    const e = alternatingEvidence(alternating(11), 11);
    expect(e.containsAlternating).toBe(true);
    expect(e.oddElement).toBeNull();
  });
  it('an imprimitive group holding a transposition is not taken for S_n', () => {
    const e = alternatingEvidence(wreathS2S3, 6);
    expect(e.primeCycle).not.toBeNull();
    expect(e.primitive).toBe(false);
    expect(e.containsAlternating).toBe(false);
  });
});
