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
  it('JSON puts each solution\'s certificate box beside it when the certificates file is given, and checks the counts', () => {
    const box = [[1, 1.5, -0.1, 0.1], [2, 2.5, 0, 0], [3, 3.5, 0, 0]] as [number, number, number, number][];
    const certificates = { slug: record.slug, unknowns: ['D', 'E', 'F'], instances: record.instances.map((i) => ({ id: i.id, boxes: i.solutions.map((_, k) => (k === 0 ? null : box)) })) };
    const doc = solutionsDocument(record, 2, certificates);
    expect(doc.unknowns).toEqual(['D', 'E', 'F']);
    expect(doc.instances[0]!.solutions.map((s) => s.certificate)).toEqual([null, box, box, box, box, box, box, box]);
    expect(doc.note).toMatch(/Krawczyk/);
    const short = { ...certificates, instances: certificates.instances.map((c) => ({ ...c, boxes: c.boxes.slice(1) })) };
    expect(() => solutionsDocument(record, 2, short)).toThrow(/has 7 boxes for 8 solutions/);
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
