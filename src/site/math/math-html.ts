import katex from 'katex';
import { escapeHtml } from '../escape-html.ts';
import { texWords } from './tex-words.ts';

/**
 * A formula as HTML: KaTeX's rendering (HTML for the eye, MathML for assistive technology) followed by a hidden span
 * with its plain words (texWords), which the search index reads instead of the TeX. A bad formula throws (KaTeX's
 * ParseError) when `throwOnError` is set, as it is for every formula the site builds.
 */
export function mathHtml(tex: string, displayMode: boolean, options: katex.KatexOptions = {}): string {
  const rendered = katex.renderToString(tex, { ...options, displayMode });
  return `${rendered}<span class="math-words" hidden> ${escapeHtml(texWords(tex))} </span>`;
}
