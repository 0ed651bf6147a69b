import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readdirSync } from 'node:fs';
import { ROOT } from './build-site.ts';
import { startSite, type Site } from './browser.ts';
import { measureFirstLoad } from './page-weight.ts';

// Weight budgets of issue 16 (our own targets, no source): a problem page's first load at most 500 KB gzip, the home
// page's at most 150 KB; and no search code on a first load. Figures are printed for the record.

let site: Site;
beforeAll(async () => { site = await startSite(); });
afterAll(async () => { await site?.close(); });

const kb = (n: number) => (n / 1024).toFixed(1);

describe('first-load weight (gzip)', () => {
  it('stays within 150 KB on the home page', async () => {
    const load = await measureFirstLoad(site.browser, `${site.url}/`);
    console.log(`first load / : ${kb(load.gzip)} KB gzip (${kb(load.bytes)} KB raw, ${load.files.length} files)`);
    expect(load.gzip).toBeLessThanOrEqual(150 * 1024);
  });

  it('stays within 500 KB on every problem page, none of it search code', async () => {
    const slugs = readdirSync(`${ROOT}dist/problems`).sort();
    const rows: string[] = [];
    for (const slug of slugs) {
      const load = await measureFirstLoad(site.browser, `${site.url}/problems/${slug}/`);
      rows.push(`${kb(load.gzip).padStart(7)} KB gzip ${kb(load.bytes).padStart(8)} KB raw  ${slug}`);
      expect(load.gzip, slug).toBeLessThanOrEqual(500 * 1024);
      expect(load.files.filter((f) => f.path.startsWith('/pagefind/')), slug).toEqual([]);
    }
    console.log(`first loads of the problem pages:\n${rows.join('\n')}`);
  }, 600_000); // one page load after another over the whole catalog: a size check, not a timed one
});
