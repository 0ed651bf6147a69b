import { describe, expect, it } from 'vitest';
import { describeChange, utcDate } from '../../src/atlas/history.ts';
import type { SolveRecord } from '../../src/atlas/record.ts';

const counts = { bezoutBound: 8, multihomogeneousBound: null, trueCount: 8, found: 8, certified: 8, certifiedDistinct: 8, real: 2, certifiedReal: 2, complete: true };
const record = (over: Partial<SolveRecord>, found = 8): SolveRecord =>
  ({ engineVersion: '0.1.0', definitionHash: 'a'.repeat(64), instances: [{ id: 'generic', counts: { ...counts, found } }], ...over }) as unknown as SolveRecord;

describe('describing what changed between two records', () => {
  it.each([
    ['an engine upgrade that finds more', record({}, 7), record({ engineVersion: '0.2.0' }), 'engine 0.1.0 → 0.2.0; generic: found 7 → 8'],
    ['an edited definition', record({}), record({ definitionHash: 'b'.repeat(64) }), 'definition changed'],
    ['the same counts', record({}), record({}), 're-solved with the same counts (solution digits, notes or figure changed)'],
  ])('%s', (_name, before, after, words) => {
    expect(describeChange(before, after)).toBe(words);
  });
});

describe('the history date', () => {
  it('is the UTC calendar date', () => {
    expect(utcDate(new Date('2026-12-31T23:30:00-05:00'), undefined)).toBe('2027-01-01');
  });
  it('can be injected for tests, and a malformed override is refused', () => {
    expect(utcDate(new Date(), '2026-02-03')).toBe('2026-02-03');
    expect(() => utcDate(new Date(), 'yesterday')).toThrow(/YYYY-MM-DD/);
  });
});
