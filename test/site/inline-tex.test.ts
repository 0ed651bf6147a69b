import { describe, expect, it } from 'vitest';
import { texToHtml } from '../../src/site/inline-tex.ts';

describe('texToHtml', () => {
  it('renders inline formulas with KaTeX and escapes the rest', () => {
    const html = texToHtml('A circle <b> is $x^2+y^2=1$ & more');
    expect(html.startsWith('A circle &lt;b&gt; is <span class="katex">')).toBe(true);
    expect(html).toContain('<span class="math-words" hidden> x²+y²=1 </span>');
    expect(html.endsWith(' &amp; more')).toBe(true);
  });
  it('renders $$…$$ in display mode', () => expect(texToHtml('$$a$$')).toContain('katex-display'));
  it('keeps an escaped dollar literal', () => expect(texToHtml('costs \\$5')).toBe('costs $5'));
  it('refuses an unclosed formula, naming where', () => expect(() => texToHtml('bad $x')).toThrow(/unclosed \$ at character 4/));
  it('refuses bad TeX, naming the formula', () => expect(() => texToHtml('$\\frac{1$')).toThrow(/bad TeX "\\frac\{1"/));
});
