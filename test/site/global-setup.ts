import { buildSite, testContentDir } from './build-site.ts';

/** Builds dist/ once for the browser tests (from the real content/ when present, else the fixture); fails fast. */
export default function setup(): void {
  const dir = testContentDir();
  const started = Date.now();
  buildSite(dir);
  console.log(`e2e: built dist/ from ${dir} in ${((Date.now() - started) / 1000).toFixed(1)} s`);
}
