// @ts-check
import { defineConfig } from 'astro/config';
import mdx from '@astrojs/mdx';
import { satteri } from '@astrojs/markdown-satteri';
import { satteriKatex } from './src/site/satteri-katex.ts';
import { pagefindIndex } from './src/site/pagefind-integration.ts';

// The atlas is static: stable directory URLs with a trailing slash, Sätteri Markdown with KaTeX at build time
// (a bad formula throws), and a Pagefind index written after every build. Content root: src/site/content-dir.ts.
// The site's address is set here once (env ATLAS_SITE_URL overrides it); permalinks, canonical links and citations
// all take it from Astro's `site`.
export default defineConfig({
  site: process.env.ATLAS_SITE_URL?.trim() || 'https://atlas.enumerative.example',
  output: 'static',
  trailingSlash: 'always',
  // Static files live under src/ so that the top level keeps only the project's fixed entries.
  publicDir: './src/public',
  build: { format: 'directory' },
  compressHTML: true,
  markdown: {
    processor: satteri({ features: { math: true }, mdastPlugins: [satteriKatex({ throwOnError: true, strict: 'error' })] }),
  },
  integrations: [mdx(), pagefindIndex()],
});
