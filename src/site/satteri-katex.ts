import { defineMdastPlugin } from 'satteri';
import katex from 'katex';

/** Sätteri mdast plugin: renders $…$ and $$…$$ with KaTeX at build time; with throwOnError a bad formula fails the entry. */
export function satteriKatex(options: katex.KatexOptions = {}) {
  const render = (tex: string, displayMode: boolean) => ({
    raw: katex.renderToString(tex, { ...options, displayMode }),
    mdxExpressions: false,
  });
  return defineMdastPlugin({
    name: 'satteri-katex',
    inlineMath: (node: { value: string }) => render(node.value, false),
    math: (node: { value: string }) => render(node.value, true),
  });
}
