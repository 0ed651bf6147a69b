import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CDPSession, Page } from 'playwright-core';
import { APOLLONIUS, FIVE_CONICS, startSite, type Site } from './browser.ts';

// Browser tests of the plane figures over the real build: Apollonius' 8 circles (Drechsler–Sterz 1999), all real in
// our demo. The figures in 3-space (the cubic surface's 27 lines among them) are tested in space-figure.e2e.test.ts.

let site: Site;
beforeAll(async () => { site = await startSite(); });
afterAll(async () => { await site?.close(); });

const transformOf = (page: Page) => page.locator('plane-figure g.viewport').first().getAttribute('transform');

async function ready(path: string, options = {}): Promise<Page & { errors: string[] }> {
  const page = await site.open(path, options);
  await page.waitForSelector('plane-figure[data-ready]');
  return page;
}

describe('pointer and keyboard', () => {
  it('zooms with the wheel, keeps points at screen size and relabels the axes for the view', async () => {
    const page = await ready('/problems/flexes-of-a-plane-cubic/');
    const fig = page.locator('plane-figure').first();
    const point = fig.locator('circle.shape-point').first();
    const r0 = Number(await point.getAttribute('r'));
    const labels0 = await fig.locator('g.ticks text').allTextContents();
    await fig.locator('svg').scrollIntoViewIfNeeded();
    const box = (await fig.locator('svg').boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.wheel(0, -600);
    await expect.poll(() => transformOf(page), { timeout: 10_000 }).toMatch(/scale\((?!1\))/);
    const k = Number(/scale\(([\d.]+)\)/.exec((await transformOf(page))!)![1]);
    expect(k).toBeGreaterThan(1.5);
    expect(Number(await point.getAttribute('r')) * k).toBeCloseTo(r0, 6);
    const labels1 = await fig.locator('g.ticks text').allTextContents();
    expect(labels1.length).toBeGreaterThan(3);
    expect(labels1).not.toEqual(labels0);
    expect(page.errors).toEqual([]);
    await page.close();
  });

  it('pans with the arrow keys and zooms with + and − on the focused figure; 0 resets', async () => {
    const page = await ready(APOLLONIUS);
    const frame = page.locator('plane-figure .figure-frame').first();
    await frame.focus();
    await page.keyboard.press('ArrowRight');
    await expect.poll(() => transformOf(page)).toMatch(/translate\(-40,0\) scale\(1\)/);
    await page.keyboard.press('+');
    await expect.poll(() => transformOf(page)).toMatch(/scale\(1\.25\)/);
    await page.keyboard.press('0');
    await expect.poll(() => transformOf(page)).toBe('translate(0,0) scale(1)');
    await page.locator('button[data-zoom="in"]').first().click();
    await expect.poll(() => transformOf(page)).toMatch(/scale\(1\.25\)/);
    await page.close();
  });

  it('shows a layer switched off as off (not pressed, unchecked) and hides it, then back', async () => {
    const page = await ready(APOLLONIUS);
    const fig = page.locator('plane-figure').first();
    const button = fig.locator('button[data-toggle-layer="solution"]');
    const solutions = fig.locator('[data-layer="solution"]');
    const check = () => button.evaluate((b) => getComputedStyle(b.querySelector('.swatch')!, '::after').content);
    expect(await check()).toBe('"✓"');
    await button.click();
    expect(await button.getAttribute('aria-pressed')).toBe('false');
    expect(await check()).toBe('none');
    for (const el of await solutions.all()) expect(await el.isVisible()).toBe(false);
    expect(await fig.locator('[data-layer="given"]').first().isVisible()).toBe(true);
    await button.click();
    expect(await solutions.first().isVisible()).toBe(true);
    await page.close();
  });
});

describe('touch', () => {
  /** Sends touch points through the DevTools protocol (start, several moves, end). */
  async function gesture(cdp: CDPSession, from: [number, number][], to: [number, number][]): Promise<void> {
    const at = (pts: [number, number][]) => pts.map(([x, y], id) => ({ x, y, id }));
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: at(from) });
    for (let s = 1; s <= 8; s++) {
      const mid = from.map(([x, y], k) => [x + ((to[k]![0] - x) * s) / 8, y + ((to[k]![1] - y) * s) / 8] as [number, number]);
      await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: at(mid) });
    }
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
  }

  it('lets one finger scroll the page past the figure, and zooms with two fingers', async () => {
    const page = await ready(APOLLONIUS, { viewport: { width: 390, height: 740 }, hasTouch: true, isMobile: true });
    const cdp = await page.context().newCDPSession(page);
    const svg = page.locator('plane-figure svg').first();
    await svg.scrollIntoViewIfNeeded();
    const box = (await svg.boundingBox())!;
    const cx = box.x + box.width / 2, cy = box.y + box.height / 2;
    const before = await page.evaluate(() => window.scrollY);
    await gesture(cdp, [[cx, cy + 100]], [[cx, cy - 100]]);
    await expect.poll(() => page.evaluate(() => window.scrollY), { timeout: 5_000 }).toBeGreaterThan(before + 50);
    expect(await transformOf(page)).toBeNull();
    await svg.scrollIntoViewIfNeeded();
    const b2 = (await svg.boundingBox())!;
    const x2 = b2.x + b2.width / 2, y2 = b2.y + b2.height / 2;
    await gesture(cdp, [[x2 - 30, y2], [x2 + 30, y2]], [[x2 - 120, y2], [x2 + 120, y2]]);
    await expect.poll(() => transformOf(page), { timeout: 5_000 }).toMatch(/scale\((?!1\))/);
    expect(await page.locator('.hint .coarse').first().isVisible()).toBe(true);
    await page.close();
  });
});

describe('export and captions', () => {
  it('downloads the figure as an SVG file with its own styles, and as a PNG at three times the size', async () => {
    const page = await ready(APOLLONIUS);
    const href = await page.locator('figcaption a.export').first().getAttribute('href');
    const svg = await page.evaluate(`fetch(${JSON.stringify(href)}).then((r) => r.text())`) as string;
    const parsed = await page.evaluate(`(() => {
      const doc = new DOMParser().parseFromString(${JSON.stringify(svg)}, 'image/svg+xml');
      return { error: doc.querySelector('parsererror') !== null, solutions: doc.querySelectorAll('[data-layer="solution"]').length, style: doc.querySelector('style')?.textContent?.length ?? 0 };
    })()`) as { error: boolean; solutions: number; style: number };
    expect(parsed).toMatchObject({ error: false, solutions: 8 });
    expect(parsed.style).toBeGreaterThan(200);
    const [download] = await Promise.all([page.waitForEvent('download'), page.locator('button[data-export-png]').first().click()]);
    expect(download.suggestedFilename()).toBe('circles-tangent-to-three-circles-three-ponds.png');
    const stream = await download.createReadStream();
    const chunks: Buffer[] = [];
    for await (const c of stream) chunks.push(c as Buffer);
    const png = Buffer.concat(chunks);
    expect(png.subarray(1, 4).toString()).toBe('PNG');
    expect(png.readUInt32BE(16)).toBe(3 * 640);
    await page.close();
  });

  it('draws the five-conic demo\'s 54 real conics in paths far smaller than before (the polylines took about 6 KB each)', async () => {
    const page = await site.open(FIVE_CONICS);
    const lengths = await page.locator('plane-figure [data-layer="solution"]').evaluateAll((els) => els.map((e) => e.getAttribute('d')?.length ?? 0));
    expect(new Set(await page.locator('plane-figure [data-layer="solution"]').evaluateAll((els) => els.map((e) => e.getAttribute('data-solution')))).size).toBe(54);
    expect(lengths.reduce((a, b) => a + b, 0) / lengths.length).toBeLessThan(1500);
    await page.close();
  });
});

describe('without JavaScript', () => {
  it('still shows the whole figure with its download link, tools hidden', async () => {
    const page = await site.open(APOLLONIUS, { javaScriptEnabled: false });
    const fig = page.locator('plane-figure').first();
    expect(await fig.getAttribute('data-ready')).toBeNull();
    expect(await fig.locator('circle[data-layer="solution"]').count()).toBe(8);
    expect(await fig.locator('circle[data-layer="solution"]').first().isVisible()).toBe(true);
    expect(await fig.locator('.figure-tools').isVisible()).toBe(false);
    expect(await page.locator('figcaption a.export').first().isVisible()).toBe(true);
    await page.close();
  });
});
