import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync, readFileSync } from 'node:fs';
import { ROOT } from './build-site.ts';
import { APOLLONIUS, FIVE_CONICS, startSite, type Site } from './browser.ts';

// axe-core (a general-purpose accessibility rule engine, the npm package axe-core) runs on every page type; the bar
// is zero serious or critical violations. The package comes from node_modules/axe-core (AXE_CORE_PATH may point to
// another axe.min.js).

const AXE = process.env.AXE_CORE_PATH ?? `${ROOT}node_modules/axe-core/axe.min.js`;

let site: Site;
let axeSource = '';
beforeAll(async () => {
  if (!existsSync(AXE)) throw new Error(`axe-core is not installed: ${AXE} is missing. Add the devDependency "axe-core" (npm install --save-dev axe-core) or set AXE_CORE_PATH.`);
  axeSource = readFileSync(AXE, 'utf8');
  site = await startSite();
});
afterAll(async () => { await site?.close(); });

interface Violation { id: string; impact: string; help: string; nodes: { target: string[] }[] }

/** Serious and critical axe violations of a page after it has settled (scripts hydrated). */
async function violations(path: string, options = {}): Promise<string[]> {
  const page = await site.open(path, options);
  await page.waitForLoadState('networkidle');
  await page.addScriptTag({ content: axeSource });
  const found = await page.evaluate('axe.run(document, { resultTypes: ["violations"] }).then((r) => r.violations)') as Violation[];
  await page.close();
  return found.filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id} (${v.impact}): ${v.help} at ${v.nodes.slice(0, 3).map((n) => n.target.join(' ')).join(', ')}`);
}

describe('axe-core on every page type', () => {
  it.each([
    ['home', '/'],
    ['problem page (figure, table, downloads, citation)', APOLLONIUS],
    ['problem page with 3264 solutions', FIVE_CONICS],
    ['problem page drawn by a projection of space', '/problems/lines-meeting-four-lines/'],
    ['problem page with a figure in 3-space', '/problems/lines-on-a-cubic-surface/'],
    ['static table page', `${FIVE_CONICS}solutions/stage-lights/2/`],
    ['families', '/families/'],
    ['family', '/families/conics/'],
    ['tags', '/tags/'],
    ['tag', '/tags/chasles/'],
    ['method', '/method/'],
    ['search with results', '/search/?q=tangent&family=circles'],
    ['not found', '/404.html'],
  ])('%s has no serious or critical violations', async (_, path) => {
    expect(await violations(path)).toEqual([]);
  });

  it('the problem page in the dark colour scheme has none either', async () => {
    expect(await violations(APOLLONIUS, { colorScheme: 'dark' })).toEqual([]);
  });

  it('the masthead search with its live results open has none', async () => {
    const page = await site.open('/');
    await page.getByLabel('Search the atlas').fill('conics');
    await page.locator('.live-results a').first().waitFor({ timeout: 20_000 });
    await page.addScriptTag({ content: axeSource });
    const found = await page.evaluate('axe.run(document, { resultTypes: ["violations"] }).then((r) => r.violations)') as Violation[];
    expect(found.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);
    await page.close();
  });
});
