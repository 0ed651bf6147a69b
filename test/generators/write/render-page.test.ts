import { describe, expect, it } from 'vitest';
import { pageFrontmatterSchema } from '../../../src/atlas/page-frontmatter.ts';
import { readFrontmatter, renderPage } from '../../../generators/write/render-page.ts';
import { fakeRecord } from '../pipeline/fixtures/solved-fixture.ts';

describe('the generated problem page', () => {
  it('has frontmatter that reads back into its schema, with recordVersion = the number of history entries', async () => {
    const record = await fakeRecord();
    const history = [
      { date: '2026-01-01', engineVersion: 'fake-0', change: 'first published; generic: found 4 of 4, certified 4, real 4' },
      { date: '2026-01-02', engineVersion: 'fake-1', change: 'engine fake-0 → fake-1' },
    ];
    const page = renderPage({ ...record, history });
    const front = pageFrontmatterSchema.parse(readFrontmatter(page));
    expect(front).toEqual({ slug: 'two-test-conics', title: 'Points common to two conics (test)', family: 'intersections', tags: ['conics', 'test'], bezoutBound: 4, trueCount: 4, recordVersion: 2, engineVersion: 'fake-1' });
  });

  it('has the three sections in order, the caution first when there is one, and escaped prose', async () => {
    const record = { ...(await fakeRecord()), caution: 'Not a substitute for engineering verification {ever}.' };
    const body = renderPage(record).split('---\n')[2]!;
    const headings = body.match(/^## .*$/gm);
    expect(headings).toEqual(['## The problem', '## Formulation', '## Where the naive count goes']);
    expect(body.trimStart().startsWith('**Caution.** Not a substitute for engineering verification \\{ever\\}.')).toBe(true);
    expect(body).toContain('finite points \\{none lost\\} \\<here>.');
    expect(body.endsWith('\n')).toBe(true);
  });
});
