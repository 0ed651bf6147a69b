import { defineMdastPlugin } from 'satteri';
import type katex from 'katex';
import { mathHtml } from './math/math-html.ts';

/** Sätteri mdast plugin: renders $…$ and $$…$$ at build time (mathHtml); with throwOnError a bad formula fails the entry. */
export function satteriKatex(options: katex.KatexOptions = {}) {
  const render = (tex: string, displayMode: boolean) => ({
    raw: mathHtml(tex, displayMode, options),
    mdxExpressions: false,
  });
  return defineMdastPlugin({
    name: 'satteri-katex',
    inlineMath: (node: { value: string }) => render(node.value, false),
    math: (node: { value: string }) => render(node.value, true),
  });
}
