import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { chromium, type Browser, type Page } from 'playwright-core';
import { readdirSync, existsSync } from 'node:fs';
import { serveStatic } from './static-server.ts';
import { ROOT } from './build-site.ts';

// Browser tests over the real build of dist/ (made by global-setup.ts), served over http on 127.0.0.1.
// Apollonius' problem: 8 circles tangent to three general circles (Viète 1600; Drechsler–Sterz 1999); the demo
// configuration is chosen so that all 8 are real.

let browser: Browser;
let server: { url: string; close: () => Promise<void> };

beforeAll(async () => {
  server = await serveStatic(`${ROOT}dist`);
  browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', headless: true, args: ['--disable-gpu'] });
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function open(path: string): Promise<Page> {
  const page = await browser.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto(server.url + path);
  (page as Page & { errors?: string[] }).errors = errors;
  return page;
}

/** Types a query into the masthead search box and returns the hrefs of the results shown. */
async function search(page: Page, query: string): Promise<string[]> {
  const input = page.locator('pagefind-searchbox input').first();
  await input.waitFor();
  await input.fill(query);
  const links = page.locator('pagefind-searchbox a[href*="/problems/"]');
  await links.first().waitFor({ timeout: 20_000 });
  return links.evaluateAll((as) => as.map((a) => (a as HTMLAnchorElement).getAttribute('href') ?? ''));
}

let found: string | null = null;

/** The Apollonius page's path, found through the search UI (once per run). */
async function apolloniusPath(): Promise<string> {
  if (found) return found;
  const page = await open('/');
  const hrefs = await search(page, 'tangent circles');
  await page.close();
  expect(hrefs.length).toBeGreaterThan(0);
  found = new URL(hrefs[0]!, server.url).pathname;
  return found;
}

describe('search', () => {
  it('finds the Apollonius page for "tangent circles" and its page shows the ladder and 3 given + 8 solution circles', async () => {
    const page = await open('/');
    await search(page, 'tangent circles');
    const results = page.locator('pagefind-searchbox a[href*="/problems/"]');
    const hit = results.filter({ hasText: 'Circles tangent to three circles' }).first();
    await hit.waitFor({ timeout: 20_000 });
    await expect.poll(() => results.first().textContent(), { timeout: 10_000 }).toContain('Circles tangent to three circles');
    await hit.click();
    await page.waitForURL(/\/problems\/[a-z0-9-]+\/$/, { timeout: 20_000 });
    await expect.poll(() => page.locator('h1').textContent(), { timeout: 10_000 }).toBe('Circles tangent to three circles');
    const ladder = page.locator('[data-count-ladder]').first();
    expect(await ladder.locator('li[data-step]').evaluateAll((li) => li.map((l) => l.getAttribute('data-step'))))
      .toEqual(expect.arrayContaining(['bezout', 'true', 'found', 'certified', 'real', 'certifiedReal']));
    expect(await ladder.locator('li[data-step="bezout"] .value').textContent()).toBe('8');
    expect(await ladder.locator('li[data-step="true"] .value').textContent()).toBe('8');
    const svg = page.locator('plane-figure svg').first();
    expect(await svg.locator('circle[data-layer="given"]').count()).toBe(3);
    expect(await svg.locator('circle[data-layer="solution"]').count()).toBe(8);
    await page.close();
  });

  it('offers family, count and realness filters in the index', async () => {
    const page = await open('/');
    await page.locator('pagefind-searchbox input').first().waitFor();
    const filters = await page.evaluate(`(async () => {
      const pf = await import('/pagefind/pagefind.js');
      await pf.init();
      return await pf.filters();
    })()`) as Record<string, Record<string, number>>;
    expect(Object.keys(filters).sort()).toEqual(expect.arrayContaining(['count', 'family', 'realness']));
    expect(Object.keys(filters.realness ?? {}).every((v) => ['all real found', 'some real', 'none real'].includes(v))).toBe(true);
    await page.close();
  });
});

describe('problem page', () => {
  it('hydrates the figure: data-ready is set and a wheel zooms the viewport', async () => {
    const page = await open(await apolloniusPath());
    const fig = page.locator('plane-figure').first();
    await page.waitForSelector('plane-figure[data-ready]');
    await fig.locator('svg').scrollIntoViewIfNeeded();
    const box = (await fig.locator('svg').boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.wheel(0, -400);
    await expect.poll(() => fig.locator('g.viewport').getAttribute('transform'), { timeout: 10_000 }).toMatch(/scale\((?!1\))/);
    expect((page as Page & { errors?: string[] }).errors).toEqual([]);
    await page.close();
  });

  it('hides the solutions when their layer toggle is pressed, and shows them again', async () => {
    const page = await open(await apolloniusPath());
    await page.waitForSelector('plane-figure[data-ready]');
    const fig = page.locator('plane-figure').first();
    const solutions = fig.locator('[data-layer="solution"]');
    expect(await solutions.first().isVisible()).toBe(true);
    await fig.locator('button[data-toggle-layer="solution"]').click();
    expect(await fig.locator('button[data-toggle-layer="solution"]').getAttribute('aria-pressed')).toBe('false');
    for (const el of await solutions.all()) expect(await el.isVisible()).toBe(false);
    expect(await fig.locator('[data-layer="given"]').first().isVisible()).toBe(true);
    await fig.locator('button[data-toggle-layer="solution"]').click();
    expect(await solutions.first().isVisible()).toBe(true);
    await page.close();
  });

  it('highlights a solution in the figure while its table row is under the pointer', async () => {
    const page = await open(await apolloniusPath());
    await page.waitForSelector('plane-figure[data-ready]');
    const fig = page.locator('plane-figure').first();
    const tableId = await fig.getAttribute('data-table');
    await page.locator(`#${tableId} tr[data-solution-row="2"]`).hover();
    expect(await fig.locator('[data-layer="solution"].is-focus').evaluateAll((els) => els.map((e) => e.getAttribute('data-solution'))))
      .toEqual(['2']);
    await page.close();
  });

  it('offers a JSON download that parses and matches the solutions table', async () => {
    const page = await open(await apolloniusPath());
    const href = await page.locator('a[href$="solutions.json"]').getAttribute('href');
    const doc = await page.evaluate(`fetch(${JSON.stringify(href)}).then((r) => r.json())`) as {
      coordinates: string[]; instances: { id: string; solutions: { values: Record<string, [number, number]> }[] }[];
    };
    expect(doc.coordinates.length).toBeGreaterThan(0);
    for (const inst of doc.instances) {
      const rows = await page.locator(`solutions-table[data-instance="${inst.id}"] tbody tr`).count();
      expect(rows).toBe(Math.min(100, inst.solutions.length));
      for (const s of inst.solutions) expect(Object.keys(s.values)).toEqual(doc.coordinates);
    }
    await page.close();
  });
});

describe('without JavaScript', () => {
  it('still shows the whole figure, with the toggle buttons hidden', async () => {
    const path = await apolloniusPath();
    const context = await browser.newContext({ javaScriptEnabled: false });
    const page = await context.newPage();
    await page.goto(server.url + path);
    const fig = page.locator('plane-figure').first();
    expect(await fig.getAttribute('data-ready')).toBeNull();
    expect(await fig.locator('circle[data-layer="solution"]').count()).toBe(8);
    expect(await fig.locator('circle[data-layer="solution"]').first().isVisible()).toBe(true);
    expect(await fig.locator('.figure-tools').isVisible()).toBe(false);
    await context.close();
  });
});

describe('home page', () => {
  it('lists every problem in the chart and in the table', async () => {
    const dir = `${ROOT}dist/problems`;
    const slugs = (existsSync(dir) ? readdirSync(dir) : []).sort();
    expect(slugs.length).toBeGreaterThan(0);
    const page = await open('/');
    const chartRows = await page.locator('svg[data-bounds-chart] [data-chart-row]').evaluateAll((els) => els.map((e) => e.getAttribute('data-chart-row')));
    const tableRows = await page.locator('table[data-problem-table] [data-problem-row]').evaluateAll((els) => els.map((e) => e.getAttribute('data-problem-row')));
    expect([...chartRows].sort()).toEqual(slugs);
    expect([...tableRows].sort()).toEqual(slugs);
    await page.close();
  });
});
