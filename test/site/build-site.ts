import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

/** The repository root (two levels above test/site/). */
export const ROOT = fileURLToPath(new URL('../../', import.meta.url));

/** Content root for test builds: env ATLAS_CONTENT_DIR, else ./content when it holds pages, else the fixture. */
export function testContentDir(env: Record<string, string | undefined> = process.env): string {
  if (env.ATLAS_CONTENT_DIR) return env.ATLAS_CONTENT_DIR;
  const pages = `${ROOT}content/problems`;
  return existsSync(pages) && readdirSync(pages).some((f) => f.endsWith('.mdx')) ? './content' : './test/fixtures/content';
}

/** Runs `astro build` (Pagefind runs in its build:done hook); throws with the log on failure, [ERROR] lines or KaTeX errors. */
export function buildSite(contentDir: string): string {
  const astro = `${ROOT}node_modules/astro/bin/astro.mjs`;
  const run = spawnSync(process.execPath, [astro, 'build'], {
    cwd: ROOT,
    env: { ...process.env, ATLAS_CONTENT_DIR: contentDir, ASTRO_TELEMETRY_DISABLED: '1' },
    encoding: 'utf8',
    maxBuffer: 64 * 1024 * 1024,
  });
  const log = `${run.stdout}\n${run.stderr}`;
  const bad = log.split('\n').filter((l) => /\[ERROR\]|KaTeX parse error/.test(l));
  if (run.status !== 0 || bad.length > 0) {
    throw new Error(`astro build from ${contentDir} failed (exit ${run.status}):\n${bad.join('\n') || log.slice(-4000)}`);
  }
  if (!existsSync(`${ROOT}dist/pagefind/pagefind.js`)) throw new Error('astro build wrote no dist/pagefind/pagefind.js');
  return log;
}
