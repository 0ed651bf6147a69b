import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { APOLLONIUS, startSite, type Site } from './browser.ts';
import { contentRecords } from './content-records.ts';

// Browser tests of search over the real build. Counts named here: Apollonius' 8 circles (Drechsler–Sterz 1999);
// the 9 flexes of a plane cubic (Hesse 1844).

let site: Site;
beforeAll(async () => { site = await startSite(); });
afterAll(async () => { await site?.close(); });

/** Result links on the search page once a search has completed. */
async function searchPageResults(page: Page): Promise<string[]> {
  await page.waitForSelector('search-page[data-searched]', { timeout: 20_000 });
  return page.locator('.search-results a').evaluateAll((as) => as.map((a) => new URL((a as HTMLAnchorElement).href).pathname));
}

describe('masthead search', () => {
  it('is a labelled form that loads no search code until the reader focuses it', async () => {
    const requested: string[] = [];
    const page = await site.open('/');
    page.on('request', (r) => requested.push(new URL(r.url()).pathname));
    await page.reload();
    await page.waitForLoadState('networkidle');
    expect(requested.filter((p) => p.startsWith('/pagefind/'))).toEqual([]);
    expect(await page.getByLabel('Search the atlas').count()).toBe(1);
    await page.getByLabel('Search the atlas').fill('tangent circles');
    const hit = page.locator(`.live-results a[href="${APOLLONIUS}"]`);
    await hit.waitFor({ timeout: 20_000 });
    expect(requested).toContain('/pagefind/pagefind.js');
    await hit.click();
    await page.waitForURL(new RegExp(`${APOLLONIUS}$`));
    expect(await page.locator('h1').textContent()).toBe('Circles tangent to three circles');
    expect(page.errors).toEqual([]);
    await page.close();
  });

  it('opens the search page with the query when submitted (works without JavaScript too)', async () => {
    const page = await site.open('/', { javaScriptEnabled: false });
    await page.getByLabel('Search the atlas').fill('flexes');
    await page.getByLabel('Search the atlas').press('Enter');
    await page.waitForURL(/\/search\/\?q=flexes$/);
    await page.close();
  });
});

describe('search page', () => {
  it('restores the query and filters from the address and shows their results', async () => {
    const page = await site.open('/search/?q=nine+flexes&family=plane-curves');
    expect(await searchPageResults(page)).toEqual(['/problems/flexes-of-a-plane-cubic/']);
    expect(await page.locator('input[name="q"]#search-q').inputValue()).toBe('nine flexes');
    expect(await page.locator('select[name="family"]').inputValue()).toBe('plane-curves');
    await page.close();
  });

  it('keeps the address up to date while the reader types and filters', async () => {
    const page = await site.open('/search/');
    await page.locator('#search-q').fill('tangent');
    await expect.poll(() => new URL(page.url()).search, { timeout: 10_000 }).toBe('?q=tangent');
    await page.locator('select[name="family"]').selectOption('circles');
    await expect.poll(() => new URL(page.url()).search, { timeout: 10_000 }).toBe('?q=tangent&family=circles');
    await expect.poll(async () => (await searchPageResults(page)).join(' '), { timeout: 10_000 }).toBe(APOLLONIUS);
    await page.close();
  });

  it('finds nothing for a nonsense word, even though formulas contain its first letters', async () => {
    const page = await site.open('/search/?q=xyzzyq');
    expect(await searchPageResults(page)).toEqual([]);
    expect(await page.locator('.search-status').textContent()).toBe('No problem matches this search.');
    await page.close();
  });

  it('shows filter values in words and excerpts without TeX', async () => {
    const page = await site.open('/search/?q=conic');
    const families = await page.locator('select[name="family"] option').allTextContents();
    expect(families.some((f) => /^Plane curves \(\d+\)$/.test(f))).toBe(true);
    const realness = await page.locator('select[name="realness"] option').allTextContents();
    expect(realness.every((r) => !/^(all real found|some real|none real)/.test(r))).toBe(true);
    await searchPageResults(page);
    const excerpts = (await page.locator('.search-results p').allTextContents()).join(' ');
    expect(excerpts.length).toBeGreaterThan(0);
    expect(excerpts).not.toMatch(/\\[a-z]+|\^\{|_\{/);
    await page.close();
  });

  it('filters by true count alone (every problem with 9 solutions)', async () => {
    const page = await site.open('/search/?count=9');
    const nine = contentRecords().filter((r) => r.trueCount === 9).map((r) => `/problems/${r.slug}/`).sort();
    expect(nine).toContain('/problems/flexes-of-a-plane-cubic/'); // Hesse 1844: a plane cubic has 9 flexes
    expect((await searchPageResults(page)).sort()).toEqual(nine);
    await page.close();
  });
});
