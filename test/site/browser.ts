import { chromium, type Browser, type BrowserContextOptions, type Page } from 'playwright-core';
import { serveStatic } from './static-server.ts';
import { ROOT } from './build-site.ts';

/** A browser and the built site (dist/, made by global-setup.ts) served on 127.0.0.1, for one test file. */
export interface Site {
  readonly url: string;
  readonly browser: Browser;
  /** Opens a path in a fresh context; `errors` collects uncaught page errors. */
  open(path: string, options?: BrowserContextOptions): Promise<Page & { errors: string[] }>;
  close(): Promise<void>;
}

/** Serves dist/ and launches Debian's Chromium (CHROMIUM_PATH overrides /usr/bin/chromium). */
export async function startSite(): Promise<Site> {
  const server = await serveStatic(`${ROOT}dist`);
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', headless: true, args: ['--disable-gpu'] });
  return {
    url: server.url,
    browser,
    async open(path, options = {}) {
      const context = await browser.newContext(options);
      const page = (await context.newPage()) as Page & { errors: string[] };
      page.errors = [];
      page.on('pageerror', (e) => page.errors.push(e.message));
      page.on('close', () => void context.close().catch(() => undefined));
      await page.goto(server.url + path);
      return page;
    },
    async close() {
      await browser.close();
      await server.close();
    },
  };
}

/** The five-conic page: 3264 conics tangent to five conics (Chasles 1864; Bashelor–Ksir–Traves 2008), 54 real in our demo. */
export const FIVE_CONICS = '/problems/conics-tangent-to-5-conics/';
/** Apollonius: 8 circles tangent to three circles (Drechsler–Sterz 1999), all 8 real in our demo. */
export const APOLLONIUS = '/problems/circles-tangent-to-three-circles/';
