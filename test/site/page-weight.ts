import { gzipSync } from 'node:zlib';
import type { Browser } from 'playwright-core';

/** What a page's first load fetched: each response's raw and gzip bytes, and the totals. */
export interface FirstLoad {
  readonly url: string;
  readonly files: { readonly path: string; readonly bytes: number; readonly gzip: number }[];
  readonly bytes: number;
  readonly gzip: number;
}

/**
 * Loads `url` in a fresh context (empty cache, 1280 × 900) and records every response until the network is idle:
 * the HTML, styles, scripts, fonts and images a first visit costs. Sizes are of the bodies as served; "gzip" is each
 * body compressed with zlib at level 6 (a common server default), summed.
 */
export async function measureFirstLoad(browser: Browser, url: string): Promise<FirstLoad> {
  const context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  const pending: Promise<{ path: string; bytes: number; gzip: number } | null>[] = [];
  page.on('response', (r) => pending.push(r.body().then(
    (body) => ({ path: new URL(r.url()).pathname, bytes: body.length, gzip: gzipSync(body, { level: 6 }).length }),
    () => null,
  )));
  await page.goto(url, { waitUntil: 'networkidle' });
  const files = (await Promise.all(pending)).filter((f): f is NonNullable<typeof f> => f !== null);
  await context.close();
  return { url, files, bytes: files.reduce((s, f) => s + f.bytes, 0), gzip: files.reduce((s, f) => s + f.gzip, 0) };
}
