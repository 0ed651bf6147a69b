import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { FIVE_CONICS, startSite, type Site } from './browser.ts';

// Browser tests of the solutions table over the real build. The five-conic problem has 3264 solutions (Chasles 1864;
// Bashelor–Ksir–Traves 2008); our stage-lights demo has 54 real ones, counted by the record itself.

let site: Site;
beforeAll(async () => { site = await startSite(); });
afterAll(async () => { await site?.close(); });

const DEMO = 'stage-lights';
const table = (page: Page) => page.locator(`solutions-table[data-instance="${DEMO}"]`);
const rowIndices = (page: Page) => table(page).locator('tbody tr').evaluateAll((rows) => rows.map((r) => Number(r.getAttribute('data-solution-row'))));

/** The demo's real solutions, from its table data. */
async function realIndices(page: Page): Promise<number[]> {
  const src = await table(page).getAttribute('data-src');
  const doc = await page.evaluate(`fetch(${JSON.stringify(src)}).then((r) => r.json())`) as { rows: unknown[][] };
  return doc.rows.filter((r) => r[1] === true).map((r) => Number(r[0]));
}

describe('five-conic demo table', () => {
  it('starts with the real solutions (all 54 proven real), all on the first page, in record order', async () => {
    const page = await site.open(FIVE_CONICS);
    const real = await realIndices(page);
    expect(real).toHaveLength(54);
    const shown = await rowIndices(page);
    expect(shown).toHaveLength(100);
    expect(shown.slice(0, 54)).toEqual(real);
    expect(await table(page).locator('tbody tr[data-real="true"]').count()).toBe(54);
    await page.close();
  });

  it('links every real solution to its curve: hovering or focusing a row lights the curve, clicking a curve selects its row', async () => {
    const page = await site.open(FIVE_CONICS);
    await page.waitForSelector(`solutions-table[data-instance="${DEMO}"][data-ready]`);
    await page.waitForSelector('plane-figure[data-figure="fig-stage-lights"][data-ready]');
    const fig = page.locator('plane-figure[data-figure="fig-stage-lights"]');
    const real = await realIndices(page);
    for (const index of real) {
      const curve = fig.locator(`[data-layer="solution"][data-solution="${index}"]`);
      expect(await curve.count(), `curve of solution ${index + 1}`).toBe(1);
      await curve.dispatchEvent('click');
      const row = table(page).locator(`tr[data-solution-row="${index}"]`);
      await expect.poll(() => row.getAttribute('class'), { timeout: 5_000 }).toMatch(/is-selected/);
      expect(await row.evaluate((r) => r === document.activeElement)).toBe(true);
    }
    const row = table(page).locator(`tr[data-solution-row="${real[3]}"]`);
    await row.hover();
    expect(await fig.locator('[data-layer="solution"].is-focus').evaluateAll((els) => els.map((e) => Number(e.getAttribute('data-solution'))))).toEqual([real[3]]);
    await table(page).locator(`tr[data-solution-row="${real[5]}"]`).focus();
    expect(await fig.locator('[data-layer="solution"].is-focus').evaluateAll((els) => els.map((e) => Number(e.getAttribute('data-solution'))))).toEqual([real[5]]);
    expect(page.errors).toEqual([]);
    await page.close();
  });

  it('reaches every row by paging, and filters to the real or certified ones', async () => {
    const page = await site.open(FIVE_CONICS);
    await page.waitForSelector(`solutions-table[data-instance="${DEMO}"][data-ready]`);
    const seen = new Set(await rowIndices(page));
    for (let p = 2; p <= 33; p++) {
      await table(page).locator(`nav.pager a[data-page-link="${p}"]`).first().click();
      await expect.poll(() => table(page).locator('nav.pager a[aria-current="page"]').textContent()).toBe(String(p));
      for (const i of await rowIndices(page)) seen.add(i);
    }
    expect(seen.size).toBe(3264);
    await table(page).getByLabel(/real \(54\)/).check();
    await expect.poll(async () => (await rowIndices(page)).length).toBe(54);
    expect(await table(page).locator('tbody tr[data-real="false"]').count()).toBe(0);
    await table(page).getByLabel(/certified/).check();
    await expect.poll(() => table(page).locator('.pager-status').textContent()).toMatch(/certified solutions/);
    await page.close();
  });

  it('sorts by any column: residual ascending, then descending', async () => {
    const page = await site.open(FIVE_CONICS);
    await page.waitForSelector(`solutions-table[data-instance="${DEMO}"][data-ready]`);
    const residualHead = table(page).locator('th[data-sort-key="residual"] button');
    await residualHead.click();
    await expect.poll(() => table(page).locator('th[data-sort-key="residual"]').getAttribute('aria-sort')).toBe('ascending');
    const src = await table(page).getAttribute('data-src');
    const residuals = await page.evaluate(`fetch(${JSON.stringify(src)}).then((r) => r.json()).then((d) => d.rows.map((r) => r[4]))`) as number[];
    const smallest = Math.min(...residuals);
    const firstIndex = Number(await table(page).locator('tbody tr').first().getAttribute('data-solution-row'));
    const doc = await page.evaluate(`fetch(${JSON.stringify(src)}).then((r) => r.json())`) as { rows: unknown[][] };
    expect(doc.rows.find((r) => r[0] === firstIndex)![4]).toBe(smallest);
    await residualHead.click();
    await expect.poll(() => table(page).locator('th[data-sort-key="residual"]').getAttribute('aria-sort')).toBe('descending');
    await page.close();
  });

  it('keeps real, certified, residual and condition in view at 1280 px without scrolling sideways', async () => {
    const page = await site.open(FIVE_CONICS, { viewport: { width: 1280, height: 900 } });
    const scroll = table(page).locator('.table-scroll');
    expect(await scroll.evaluate((el) => el.scrollWidth <= el.clientWidth + 1)).toBe(true);
    await page.close();
  });
});

describe('without JavaScript', () => {
  it('reaches the second page of rows through a static page', async () => {
    const page = await site.open(FIVE_CONICS, { javaScriptEnabled: false });
    await table(page).locator('nav.pager a[rel="next"]').click();
    await page.waitForURL(/\/solutions\/stage-lights\/2\/$/);
    const rows = await rowIndices(page);
    expect(rows).toHaveLength(100);
    await page.close();
  });
});
