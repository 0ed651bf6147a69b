import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkContent } from '../../../generators/write/check-content.ts';
import { certificatesPath, pagePath, recordPath, systemsPath } from '../../../generators/write/content-paths.ts';
import type { SolveRecord } from '../../../src/atlas/record.ts';
import { publish } from '../../../generators/write/publish.ts';
import { fakeRecord } from '../pipeline/fixtures/solved-fixture.ts';

const SLUG = 'two-test-conics';

/** Sidecar files that agree with a record: one equation per degree, one box per solution (values are placeholders). */
function sidecarsOf(record: SolveRecord) {
  const unknowns = [...record.formulation.unknowns];
  return {
    systems: { slug: record.slug, unknowns, instances: record.instances.map((i) => ({ id: i.id, parameters: {}, equations: record.formulation.equationDegrees.map(() => 'x - 1') })) },
    certificates: { slug: record.slug, unknowns, instances: record.instances.map((i) => ({ id: i.id, boxes: i.solutions.map(() => unknowns.map(() => [0, 1, 0, 1] as [number, number, number, number])) })) },
  };
}

/** A content root holding the published test problem with its sidecar files, damaged by `damage`. */
async function damaged(damage: (root: string) => void): Promise<string[]> {
  const root = mkdtempSync(join(tmpdir(), 'atlas-content-'));
  const record = await fakeRecord();
  publish(root, record, { date: '2026-01-02' }, sidecarsOf(record));
  damage(root);
  return checkContent(root).errors;
}

const edit = (file: string, from: string | RegExp, to: string): void => writeFileSync(file, readFileSync(file, 'utf8').replace(from, to));

describe('checking content files', () => {
  it('finds nothing wrong with freshly published content', async () => {
    expect(await damaged(() => {})).toEqual([]);
  });

  it.each([
    ['a record that is not JSON', (r: string) => writeFileSync(recordPath(r, SLUG), '{"slug": '), /two-test-conics\.json: \(root\): cannot be parsed/],
    ['a record with a negative count', (r: string) => edit(recordPath(r, SLUG), '"found": 4', '"found": -4'), /two-test-conics\.json: instances\[0\]\.counts\.found: /],
    ['a record whose path counts do not add up', (r: string) => edit(recordPath(r, SLUG), '"failed": 0', '"failed": 1'), /two-test-conics\.json: instances\[0\]\.paths: path outcomes do not add up/],
    ['a page whose frontmatter lost its title', (r: string) => edit(pagePath(r, SLUG), /title: .*\n/, ''), /two-test-conics\.mdx: title: /],
    ['a page edited by hand', (r: string) => edit(pagePath(r, SLUG), 'The problem', 'A problem'), /two-test-conics\.mdx: differs from what its record renders/],
    ['a record without its page', (r: string) => rmSync(pagePath(r, SLUG)), /two-test-conics\.json: has no page/],
    ['a page without its record', (r: string) => rmSync(recordPath(r, SLUG)), /two-test-conics\.mdx: has no record/],
    ['a systems file missing an equation', (r: string) => edit(systemsPath(r, SLUG), /"x - 1",\n/, ''), /systems\/two-test-conics\.json: instances\.[a-z-]+\.equations: 1 equations for 2/],
    ['a certificates file missing a box', (r: string) => edit(certificatesPath(r, SLUG), /\[\[0,1,0,1\],\[0,1,0,1\]\],\n/, ''), /certificates\/two-test-conics\.json: instances\.[a-z-]+\.boxes: 3 boxes for 4 solutions/],
    ['a certificates file without a record', (r: string) => { rmSync(recordPath(r, SLUG)); rmSync(pagePath(r, SLUG)); }, /certificates\/two-test-conics\.json: has no record/],
  ])('names the file and field of %s', async (_name, damage, message) => {
    const errors = await damaged(damage);
    expect(errors.join('\n')).toMatch(message);
  });
});
