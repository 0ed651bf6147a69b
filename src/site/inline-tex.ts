import katex from 'katex';

const ESCAPES: Readonly<Record<string, string>> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Escapes text for HTML element content and attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (ch) => ESCAPES[ch]!);
}

/**
 * A short record string with $…$ (inline) and $$…$$ (display) TeX as HTML: formulas rendered by KaTeX (a bad
 * formula throws, naming it), other text escaped; "\$" stands for a literal dollar. Throws on an unclosed $.
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
      html += katex.renderToString(tex, { displayMode: display, throwOnError: true });
    } catch (error) {
      throw new Error(`bad TeX "${tex}" in "${text}": ${(error as Error).message}`, { cause: error });
    }
    i = close + open;
  }
  return html;
}
