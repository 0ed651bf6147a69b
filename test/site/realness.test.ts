import { describe, expect, it } from 'vitest';
import { realnessOf, recordRealness } from '../../src/site/realness.ts';
import { fixtureRecord } from './fixture-record.ts';

describe('realness filter', () => {
  const record = fixtureRecord('apollonius-circles');
  const demo = record.instances.find((i) => i.kind === 'demo')!;
  const withCounts = (found: number, real: number) => ({ ...demo, counts: { ...demo.counts, found, real } });
  it.each([
    [8, 8, 'all real found'],
    [8, 2, 'some real'],
    [8, 0, 'none real'],
    [0, 0, 'none real'],
  ] as const)('%d found, %d real → %s', (found, real, want) => expect(realnessOf(withCounts(found, real))).toBe(want));
  it('judges a record by its demo configuration first', () => expect(recordRealness(record)).toBe('all real found'));
});
