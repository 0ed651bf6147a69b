import { describe, expect, it } from 'vitest';
import { bezoutBound, multihomogeneousBound, multihomogeneousCount } from '../../../src/engine/start/bounds.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { bitangents, linesOnCubic, randomSystem } from '../../../generators/bench/engine-systems.ts';

describe('Bézout bounds read off the graph', () => {
  it.each([
    // Bézout 1779: the product of the degrees
    ['two conics', () => randomSystem(createRandom(1), 2, 2), 4],
    ['two cubics', () => randomSystem(createRandom(1), 2, 3), 9],
    ['three quadrics', () => randomSystem(createRandom(1), 3, 2), 8],
    // [derived] in /work/shared/REFERENCES.md: lines on a cubic surface, chart: 4 cubics → 81
    ['lines on a cubic surface', () => linesOnCubic(createRandom(1)), 81],
    // [derived] REFERENCES.md: bitangents y = mx + k with a square factor → 1080
    ['bitangents of a quartic', () => bitangents(createRandom(1)), 1080],
  ])('%s: total degree bound %i', (_, make, expected) => {
    expect(bezoutBound(make())).toBe(expected);
  });

  it.each([
    // [derived] REFERENCES.md: two groups give 45 (27 lines) and 288 (bitangents); recomputed by hand:
    // (3z₁ + 0z₂)… for the lines: bidegrees (3,0),(2,1),(1,2),(0,3) → coefficient of z₁²z₂² = 45.
    ['lines on a cubic surface', () => linesOnCubic(createRandom(1)), 45],
    ['bitangents of a quartic', () => bitangents(createRandom(1)), 288],
  ])('%s: two-homogeneous bound %i', (_, make, expected) => {
    expect(multihomogeneousBound(make())).toBe(expected);
  });

  it('is null without variable groups', () => {
    expect(multihomogeneousBound(randomSystem(createRandom(1), 2, 2))).toBeNull();
  });

  it('counts the coefficient of z₁z₂ in (z₁ + 2z₂)(3z₁ + z₂) as 1·1 + 2·3 = 7 (hand arithmetic)', () => {
    expect(multihomogeneousCount([[1, 2], [3, 1]], [1, 1])).toBe(7);
  });

  it('with one group equals the total degree (Morgan–Sommese 1987: the 1-homogeneous case is Bézout)', () => {
    expect(multihomogeneousCount([[2], [3], [4]], [3])).toBe(24);
  });

  it('rejects a non-square system with a clear message', () => {
    const s = randomSystem(createRandom(1), 2, 2);
    expect(() => bezoutBound({ ...s, equations: s.equations.slice(0, 1) })).toThrow(/1 equations in 2 unknowns/);
  });

  it('rejects groups that do not partition the unknowns', () => {
    const s = randomSystem(createRandom(1), 2, 2);
    expect(() => multihomogeneousBound({ ...s, groups: [[0], [0]] })).toThrow(/in groups 0 and 1/);
    expect(() => multihomogeneousBound({ ...s, groups: [[0]] })).toThrow(/in no variable group/);
  });
});
