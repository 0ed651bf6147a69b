import type { AstroIntegration } from 'astro';
import { fileURLToPath } from 'node:url';
import * as pagefind from 'pagefind';

/** Throws with every message when a Pagefind call reports errors, naming the step that failed. */
function assertPagefind(step: string, errors: readonly string[]): void {
  if (errors.length > 0) throw new Error(`pagefind ${step} failed: ${errors.join('; ')}`);
}

/** Formulas are indexed by their plain words (the hidden span mathHtml writes), never by KaTeX's HTML, MathML or TeX. */
export const EXCLUDE_SELECTORS = ['.katex'];

/** Astro integration: after the build, indexes dist/ with the Pagefind Node API and writes dist/pagefind/. */
export function pagefindIndex(): AstroIntegration {
  return {
    name: 'atlas-pagefind-index',
    hooks: {
      'astro:build:done': async ({ dir, logger }) => {
        const { index, errors } = await pagefind.createIndex({ forceLanguage: 'en', excludeSelectors: EXCLUDE_SELECTORS });
        try {
          if (!index) throw new Error(`pagefind createIndex failed: ${errors.join('; ')}`);
          const added = await index.addDirectory({ path: fileURLToPath(dir) });
          assertPagefind('addDirectory', added.errors);
          const written = await index.writeFiles({ outputPath: fileURLToPath(new URL('./pagefind/', dir)) });
          assertPagefind('writeFiles', written.errors);
          logger.info(`pagefind indexed ${added.page_count} pages`);
        } finally {
          await pagefind.close();
        }
      },
    },
  };
}
