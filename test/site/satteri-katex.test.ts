import { describe, expect, it } from 'vitest';
import { markdownToHtml } from 'satteri';
import { satteriKatex } from '../../src/site/satteri-katex.ts';

const render = (md: string) =>
  markdownToHtml(md, { features: { math: true }, mdastPlugins: [satteriKatex({ throwOnError: true })] } as Parameters<typeof markdownToHtml>[1]);

describe('satteriKatex', () => {
  it('renders inline and display math with KaTeX at build time', async () => {
    const { html } = await render('Bézout gives $2^3 = 8$.\n\n$$\n\\binom{n}{k}\n$$\n');
    expect(html).toContain('<annotation encoding="application/x-tex">2^3 = 8</annotation>');
    expect(html).toContain('katex-display');
  });
  it('throws on a bad formula instead of printing red text', async () => {
    await expect(Promise.resolve().then(() => render('bad $\\frac{1$'))).rejects.toThrow(/KaTeX parse error/);
  });
});
