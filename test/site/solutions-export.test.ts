import { describe, expect, it } from 'vitest';
import { csvField, solutionsCsv, solutionsDocument } from '../../src/site/solutions-export.ts';
import { fixtureRecord } from './fixture-record.ts';

describe('solutions downloads', () => {
  const record = fixtureRecord('apollonius-circles');
  it('JSON keys every value by its coordinate name, demo instance first', () => {
    const doc = solutionsDocument(record, 2);
    expect(doc.recordVersion).toBe(2);
    expect(doc.instances.map((i) => i.kind)).toEqual(['demo', 'generic']);
    expect(Object.keys(doc.instances[0]!.solutions[0]!.values)).toEqual(['D', 'E', 'F']);
    expect(JSON.parse(JSON.stringify(doc))).toEqual(doc);
  });
  it('CSV has a header, one row per solution and re/im columns per coordinate', () => {
    const lines = solutionsCsv(record).trimEnd().split('\r\n');
    expect(lines[0]).toBe('instance,index,D_re,D_im,E_re,E_im,F_re,F_im,residual,condition,multiplicity,real,certified,certified_real');
    expect(lines).toHaveLength(1 + 16);
    expect(lines.slice(1).every((l) => l.split(',').length === 14)).toBe(true);
  });
  it('refuses a solution with the wrong number of values, naming it', () => {
    const bad = structuredClone(record);
    bad.instances[0]!.solutions[3]!.values.pop();
    expect(() => solutionsCsv(bad)).toThrow(/instance "courtyard-beds", solution 3/);
  });
  // RFC 4180 §2: fields with commas, quotes or line breaks are quoted; quotes doubled.
  it.each([['plain', 'plain'], ['a,b', '"a,b"'], ['say "hi"', '"say ""hi"""'], [null, ''], [true, 'true']] as const)(
    'csvField(%j) is %s', (v, want) => expect(csvField(v)).toBe(want),
  );
});
