import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkExplorations } from '../../../generators/write/check-explorations.ts';
import type { SolveRecord } from '../../../src/atlas/record.ts';

const good = {
  schemaVersion: 1, slug: 'points-common-to-two-conics', engineVersion: '0.3.0', definitionHash: 'a'.repeat(64), seed: 1, degree: 4,
  samples: 3, incompleteSamples: 0, distribution: [{ real: 0, samples: 1 }, { real: 2, samples: 2 }], climbSteps: 2,
  climb: [{ step: 1, scale: 0.5, real: 4 }], best: { real: 4, origin: 'climb step 1', parameters: { a: 1 } }, realMaximum: null,
};

function root(files: Record<string, string>): string {
  const dir = mkdtempSync(join(tmpdir(), 'explorations-'));
  mkdirSync(join(dir, 'explorations'));
  for (const [name, text] of Object.entries(files)) writeFileSync(join(dir, 'explorations', name), text);
  return dir;
}
const records = new Map([['points-common-to-two-conics', {} as SolveRecord]]);

describe('checking exploration files', () => {
  it.each([
    ['a valid file', { 'points-common-to-two-conics.json': JSON.stringify(good) }, []],
    ['a file that is not JSON', { 'points-common-to-two-conics.json': '{ nope' }, ['points-common-to-two-conics.json']],
    ['a field of the wrong kind', { 'points-common-to-two-conics.json': JSON.stringify({ ...good, samples: -1 }) }, ['samples']],
    ['a slug that is not its file name', { 'other.json': JSON.stringify(good) }, ['does not match the file name']],
    ['no record of the problem', { 'lonely.json': JSON.stringify({ ...good, slug: 'lonely' }) }, ['has no record']],
  ] as const)('%s', (_, files, words) => {
    const errors = checkExplorations(root(files), records);
    expect(errors).toHaveLength(words.length);
    words.forEach((w, i) => expect(errors[i]).toContain(w));
  });
});
