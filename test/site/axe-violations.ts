import { existsSync, readFileSync } from 'node:fs';
import { ROOT } from './build-site.ts';
import type { Site } from './browser.ts';

/** Where axe-core's browser bundle is read from (AXE_CORE_PATH overrides node_modules/axe-core/axe.min.js). */
export const AXE = process.env.AXE_CORE_PATH ?? `${ROOT}node_modules/axe-core/axe.min.js`;

interface Violation { id: string; impact: string; help: string; nodes: { target: string[] }[] }

/**
 * The serious and critical axe-core violations of a page once its network is idle (scripts hydrated), one line each;
 * throws when axe-core is not installed.
 */
export async function seriousViolations(site: Site, path: string, options = {}): Promise<string[]> {
  if (!existsSync(AXE)) throw new Error(`axe-core is not installed: ${AXE} is missing (devDependency "axe-core", or set AXE_CORE_PATH).`);
  const page = await site.open(path, options);
  await page.waitForLoadState('networkidle');
  await page.addScriptTag({ content: readFileSync(AXE, 'utf8') });
  const found = await page.evaluate('axe.run(document, { resultTypes: ["violations"] }).then((r) => r.violations)') as Violation[];
  await page.close();
  return found.filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id} (${v.impact}): ${v.help} at ${v.nodes.slice(0, 3).map((n) => n.target.join(' ')).join(', ')}`);
}
