import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startSite, type Site } from './browser.ts';
import { contentRecords } from './content-records.ts';

// Browser tests of the links between pages. The conic ladders are Chasles's numbers (Comptes Rendus 1864):
// points and conics 1, 6, 36, 184, 816, 3264; points and lines 1, 2, 4, 4, 2, 1.

let site: Site;
beforeAll(async () => { site = await startSite(); });
afterAll(async () => { await site?.close(); });

describe('links', () => {
  it('lead from a tag to its page, which lists the problems carrying it', async () => {
    const page = await site.open('/problems/conics-tangent-to-5-conics/');
    await page.locator('ul.tags a', { hasText: /^Chasles$/ }).click();
    await page.waitForURL(/\/tags\/chasles\/$/);
    const rows = await page.locator('table[data-problem-table] [data-problem-row]').count();
    expect(rows).toBe(contentRecords().filter((r) => r.tags.includes('Chasles')).length);
    await page.close();
  });

  it('join the rungs of a ladder in order, the page itself marked', async () => {
    const page = await site.open('/problems/conics-through-2-points-tangent-to-3-conics/');
    const ladder = page.locator('nav[aria-label^="Ladder: Conics through p points tangent to 5 − p conics"]');
    expect(await ladder.locator('li').allTextContents()).toEqual([
      'p = 5: Conics through 5 points',
      'p = 4: Conics through 4 points and tangent to 1 conic',
      'p = 3: Conics through 3 points and tangent to 2 conics',
      'p = 2: Conics through 2 points and tangent to 3 conics',
      'p = 1: Conics through 1 point and tangent to 4 conics',
      'p = 0: Conics tangent to five conics',
    ]);
    expect(await ladder.locator('[aria-current="page"]').textContent()).toBe('p = 2: Conics through 2 points and tangent to 3 conics');
    expect(await page.locator('nav[aria-label="Same count"] a').count()).toBe(0);
    await page.close();
  });

  it('list problems with the same count (9: the flexes, two cubics, and every other page whose count is 9)', async () => {
    const page = await site.open('/problems/flexes-of-a-plane-cubic/');
    const others = contentRecords().filter((r) => r.trueCount === 9 && r.slug !== 'flexes-of-a-plane-cubic').map((r) => r.title).sort();
    expect(others).toContain('Points common to two plane cubics'); // Bézout: 3 · 3 = 9
    expect((await page.locator('nav[aria-label="Same count"] a').allTextContents()).sort()).toEqual(others);
    await page.close();
  });

  it('sort the home page\'s problems table by any column', async () => {
    const page = await site.open('/');
    const counts = () => page.locator('table[data-problem-table] tbody tr').evaluateAll((rows) => rows.map((r) => (r as HTMLTableRowElement).cells[3]!.dataset.sort));
    await page.locator('table[data-problem-table] th', { hasText: 'True count' }).locator('button').click();
    const ascending = (await counts()).map(Number);
    expect(ascending).toEqual([...ascending].sort((a, b) => a - b));
    await page.locator('table[data-problem-table] th', { hasText: 'True count' }).locator('button').click();
    const descending = (await counts()).map(Number);
    expect(descending[0]).toBe(3264);
    await page.close();
  });

  it('keep the home chart\'s labels readable on a phone (at least 12 px)', async () => {
    const page = await site.open('/', { viewport: { width: 375, height: 800 }, isMobile: true });
    const sizes = await page.locator('[data-bounds-chart] li a').evaluateAll((as) => as.map((a) => parseFloat(getComputedStyle(a).fontSize) * (a.getBoundingClientRect().width / (a as HTMLElement).offsetWidth || 1)));
    expect(Math.min(...sizes)).toBeGreaterThanOrEqual(12);
    await page.close();
  });
});
