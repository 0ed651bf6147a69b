import { describe, expect, it } from 'vitest';
import { bezoutFromDegrees, countLadder, instancesInPageOrder, ladderFraction } from '../../src/site/ladder.ts';
import { fixtureRecord } from './fixture-record.ts';

describe('bezoutFromDegrees', () => {
  // Bézout's theorem: n general hypersurfaces of degrees d₁…dₙ meet in ∏dᵢ points (Bézout 1779; Fulton 1984).
  it.each([
    [[2, 2], 4], // two conics (Fulton, Algebraic Curves 1969)
    [[2, 2, 2], 8], // Apollonius in circle space (REFERENCES.md)
    [[6, 6, 6, 6, 6], 7776], // five conic tangencies (Steiner 1848's count)
  ])('degrees %j give %d', (d, want) => expect(bezoutFromDegrees(d)).toBe(want));
  it('rejects an empty formulation', () => expect(() => bezoutFromDegrees([])).toThrow(/at least one equation/));
  it('rejects a product beyond exact integers', () => expect(() => bezoutFromDegrees(Array(60).fill(10))).toThrow(/safe integer/));
});

describe('countLadder', () => {
  const record = fixtureRecord('apollonius-circles');
  const demo = instancesInPageOrder(record)[0]!;
  it('puts the demo configuration first', () => expect(demo.kind).toBe('demo'));
  it('lists the rungs in order, without a multihomogeneous bound when the record has none', () => {
    expect(countLadder(record, demo).map((s) => s.key)).toEqual(['bezout', 'true', 'found', 'certified', 'real', 'certifiedReal']);
  });
  it('includes the multihomogeneous bound when present', () => {
    const inst = { ...demo, counts: { ...demo.counts, multihomogeneousBound: 6 } };
    expect(countLadder(record, inst).map((s) => s.key)).toContain('multihomogeneous');
  });
  // Apollonius: Bézout 8 = true count 8 (Viète 1600; Drechsler–Sterz 1999).
  it('shows Bézout 8 from the degrees and the true count 8 with its source', () => {
    const [bez, tru] = countLadder(record, demo);
    expect(bez).toMatchObject({ value: 8, note: 'product of the degrees 2 · 2 · 2', fraction: 1 });
    expect(tru).toMatchObject({ value: 8, note: 'Drechsler–Sterz 1999' });
  });
  it('refuses a record whose stored Bézout bound disagrees with its degrees, naming problem and instance', () => {
    const inst = { ...demo, counts: { ...demo.counts, bezoutBound: 64 } };
    expect(() => countLadder(record, inst)).toThrow(/apollonius-circles.*courtyard-beds.*64.*give 8/);
  });
});

describe('ladderFraction', () => {
  it.each([[0, 8, 0], [8, 8, 1], [null, 8, 0], [3264, 7776, Math.log1p(3264) / Math.log1p(7776)]])('%s of %d → %d', (v, m, want) => {
    expect(ladderFraction(v, m)).toBeCloseTo(want, 12);
  });
});
