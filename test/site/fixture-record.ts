import { readFileSync } from 'node:fs';
import { solveRecordSchema, type SolveRecord } from '../../src/atlas/record.ts';

/** A fixture record from test/fixtures/content/records/, parsed through the record schema (a fresh copy per call). */
export function fixtureRecord(slug: 'apollonius-circles' | 'two-conics'): SolveRecord {
  const url = new URL(`../fixtures/content/records/${slug}.json`, import.meta.url);
  return solveRecordSchema.parse(JSON.parse(readFileSync(url, 'utf8')));
}
