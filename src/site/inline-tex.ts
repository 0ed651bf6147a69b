import { escapeHtml } from './escape-html.ts';
import { mathHtml } from './math/math-html.ts';

/**
 * A short record string with $…$ (inline) and $$…$$ (display) TeX as HTML: formulas rendered by KaTeX with their
 * plain words for search (mathHtml; a bad formula throws, naming it), other text escaped; "\$" stands for a literal dollar. Throws on an unclosed $.
 */
export function texToHtml(text: string): string {
  let html = '';
  let i = 0;
  while (i < text.length) {
    const ch = text[i]!;
    if (ch === '\\' && text[i + 1] === '$') { html += '$'; i += 2; continue; }
    if (ch !== '$') { html += escapeHtml(ch); i += 1; continue; }
    const display = text[i + 1] === '$';
    const open = display ? 2 : 1;
    const close = text.indexOf(display ? '$$' : '$', i + open);
    if (close < 0) throw new Error(`unclosed ${display ? '$$' : '$'} at character ${i} in "${text}"`);
    const tex = text.slice(i + open, close);
    try {
      html += mathHtml(tex, display, { throwOnError: true });
    } catch (error) {
      throw new Error(`bad TeX "${tex}" in "${text}": ${(error as Error).message}`, { cause: error });
    }
    i = close + open;
  }
  return html;
}
