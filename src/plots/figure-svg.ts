import type { Scene, SceneItem } from './figure-scene.ts';
import type { WorldWindow } from './world-window.ts';
import { layerClass, layerLabel } from './layer-names.ts';
import { gridSvg } from './axis-ticks.ts';
import { escapeHtml } from '../site/escape-html.ts';

/** How to write a figure's SVG: its id (for the clip path), what labels it, and the standalone extras. */
export interface FigureSvgOptions {
  readonly id: string;
  readonly window: WorldWindow;
  /** Id of the element that labels the figure on a page (its caption). */
  readonly labelledBy?: string;
  /** For a file of its own: a <title>, the stylesheet text, and pixel width and height. */
  readonly standalone?: { readonly title: string; readonly css: string };
}

const attrText = (attrs: Readonly<Record<string, string | number>>) =>
  Object.entries(attrs).map(([k, v]) => ` ${k}="${escapeHtml(String(v))}"`).join('');

function itemTitle(it: SceneItem): string {
  return it.label ?? (it.solution !== null ? `${layerLabel(it.layer)}: solution ${it.solution + 1}` : layerLabel(it.layer));
}

/**
 * A laid-out figure as SVG text: background, grid, the layers (one <g data-layer-group> each; items carry
 * data-layer, data-solution and a <title>) inside a g.viewport the page pans and zooms, tick labels on top.
 * data-window holds the world window so the page can relabel the axes. Deterministic for a given scene.
 */
export function figureSvg(scene: Scene, options: FigureSvgOptions): string {
  const { width, height } = scene;
  const w = options.window;
  const { grid, ticks } = gridSvg(width, height, scene.xTicks, scene.yTicks);
  const layers = scene.layers.map((l) => {
    const items = l.items.map((it) => {
      const data = ` class="shape-${it.kind}" data-layer="${escapeHtml(it.layer)}"${it.solution !== null ? ` data-solution="${it.solution}"` : ''}`;
      return `<${it.tag}${attrText(it.attrs)}${data}><title>${escapeHtml(itemTitle(it))}</title></${it.tag}>`;
    }).join('');
    return `<g data-layer-group="${escapeHtml(l.name)}" class="${layerClass(l.name)}">${items}</g>`;
  }).join('');
  const s = options.standalone;
  const head = s ? `<title>${escapeHtml(s.title)}</title><style>${s.css}</style>` : '';
  const size = s ? ` width="${width}" height="${height}"` : '';
  const label = options.labelledBy ? ` role="img" aria-labelledby="${escapeHtml(options.labelledBy)}"` : ' role="img"';
  const clip = `clip-${options.id}`;
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${width} ${height}"${size} class="figure-svg"${label} data-window="${w.xMin} ${w.xMax} ${w.yMin} ${w.yMax}">` +
    `${head}<defs><clipPath id="${clip}"><rect width="${width}" height="${height}"/></clipPath></defs>` +
    `<rect class="plot-bg" width="${width}" height="${height}"/>` +
    `<g clip-path="url(#${clip})"><g class="grid" aria-hidden="true">${grid}</g><g class="viewport">${layers}</g></g>` +
    `<g class="ticks" aria-hidden="true">${ticks}</g></svg>`;
}
