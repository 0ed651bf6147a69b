// Client-side only: the <plane-figure> custom element. The SVG inside is complete without JavaScript; this adds
// pan and zoom (d3-zoom on the <svg>, transform on g.viewport; mouse and wheel, two fingers on touch screens so one
// finger still scrolls the page, arrow and +/−/0 keys on the focused frame, buttons), axes relabelled for the view,
// points kept at their screen size, layer toggles, a PNG export of the drawing, and the link to the solutions table
// named by data-table: hovering or focusing a row lights its items, clicking an item asks the table to reveal its row.
// Sets data-ready when hydrated.
import { select } from 'd3-selection';
import { scaleLinear } from 'd3-scale';
import { zoom, zoomIdentity, type D3ZoomEvent, type ZoomBehavior, type ZoomTransform } from 'd3-zoom';
import { axisTicks, gridSvg } from '../plots/axis-ticks.ts';
import { MARGIN, POINT_RADIUS } from '../plots/figure-constants.ts';
import { linkFigureToTable } from './figure-table-link.ts';

/** Zoom limits (the drawing reaches MARGIN beyond the window, so zooming out to 1 / (1 + 2·MARGIN) shows all of it). */
const MIN_ZOOM = 1 / (1 + 2 * MARGIN), MAX_ZOOM = 40;
const KEY_STEP = 40, KEY_ZOOM = 1.25, PNG_SCALE = 3;

class PlaneFigure extends HTMLElement {
  #zoom: ZoomBehavior<SVGSVGElement, unknown> | null = null;
  #svg: SVGSVGElement | null = null;

  connectedCallback(): void {
    const svg = this.querySelector<SVGSVGElement>('svg.figure-svg');
    const viewport = svg?.querySelector<SVGGElement>('g.viewport');
    const frame = this.querySelector<HTMLElement>('.figure-frame');
    if (!svg || !viewport || !frame) return;
    this.#svg = svg;
    const width = svg.viewBox.baseVal.width, height = svg.viewBox.baseVal.height;
    const [xMin, xMax, yMin, yMax] = (svg.dataset.window ?? '').split(' ').map(Number) as [number, number, number, number];
    const x = scaleLinear().domain([xMin, xMax]).range([0, width]);
    const y = scaleLinear().domain([yMin, yMax]).range([height, 0]);
    const points = [...svg.querySelectorAll<SVGCircleElement>('circle.shape-point')];
    const grid = svg.querySelector('g.grid'), ticks = svg.querySelector('g.ticks');
    const behaviour = zoom<SVGSVGElement, unknown>()
      .scaleExtent([MIN_ZOOM, MAX_ZOOM])
      .extent([[0, 0], [width, height]])
      .translateExtent([[-MARGIN * width, -MARGIN * height], [(1 + MARGIN) * width, (1 + MARGIN) * height]])
      // Touch: only gestures with two or more fingers, so a one-finger swipe scrolls the page past the figure.
      .filter((event: Event) => ('touches' in event ? (event as TouchEvent).touches.length >= 2 : !(event as MouseEvent).button && (!(event as MouseEvent).ctrlKey || event.type === 'wheel')))
      .on('zoom', (event: D3ZoomEvent<SVGSVGElement, unknown>) => {
        const t = event.transform;
        viewport.setAttribute('transform', t.toString());
        for (const p of points) p.setAttribute('r', String(POINT_RADIUS / t.k));
        const view = axisTicks(t.rescaleX(x), t.rescaleY(y), width, height);
        const drawn = gridSvg(width, height, view.xTicks, view.yTicks);
        if (grid) grid.innerHTML = drawn.grid;
        if (ticks) ticks.innerHTML = drawn.ticks;
        this.toggleAttribute('data-zoomed', !isIdentity(t));
      });
    select(svg).call(behaviour).on('dblclick.zoom', null);
    this.#zoom = behaviour;
    frame.tabIndex = 0;
    frame.setAttribute('role', 'group');
    frame.setAttribute('aria-label', 'Figure: arrow keys pan, plus and minus zoom, 0 resets the view');
    frame.addEventListener('keydown', (e) => this.#key(e));
    for (const button of this.querySelectorAll<HTMLButtonElement>('button[data-toggle-layer]')) {
      button.addEventListener('click', () => this.#toggle(button));
    }
    for (const button of this.querySelectorAll<HTMLButtonElement>('button[data-zoom]')) {
      button.addEventListener('click', () => this.#scaleBy(button.dataset.zoom === 'in' ? KEY_ZOOM : 1 / KEY_ZOOM));
    }
    this.querySelector('button[data-reset-view]')?.addEventListener('click', () => this.#reset());
    this.querySelector('button[data-export-png]')?.addEventListener('click', () => void this.#exportPng());
    linkFigureToTable(this, svg);
    this.querySelector<HTMLElement>('.figure-tools')?.removeAttribute('hidden');
    this.setAttribute('data-ready', '');
  }

  #scaleBy(factor: number): void {
    if (this.#svg && this.#zoom) select(this.#svg).call(this.#zoom.scaleBy, factor);
  }

  #reset(): void {
    if (this.#svg && this.#zoom) select(this.#svg).call(this.#zoom.transform, zoomIdentity);
  }

  #key(e: KeyboardEvent): void {
    if (!this.#svg || !this.#zoom || e.altKey || e.ctrlKey || e.metaKey) return;
    const pan: Readonly<Record<string, [number, number]>> = { ArrowLeft: [KEY_STEP, 0], ArrowRight: [-KEY_STEP, 0], ArrowUp: [0, KEY_STEP], ArrowDown: [0, -KEY_STEP] };
    const move = pan[e.key];
    if (move) {
      const k = (this.#svg as SVGSVGElement & { __zoom?: ZoomTransform }).__zoom?.k ?? 1;
      select(this.#svg).call(this.#zoom.translateBy, move[0] / k, move[1] / k);
    } else if (e.key === '+' || e.key === '=') this.#scaleBy(KEY_ZOOM);
    else if (e.key === '-' || e.key === '_') this.#scaleBy(1 / KEY_ZOOM);
    else if (e.key === '0') this.#reset();
    else return;
    e.preventDefault();
  }

  #toggle(button: HTMLButtonElement): void {
    const layer = button.dataset.toggleLayer;
    const shown = button.getAttribute('aria-pressed') !== 'true';
    button.setAttribute('aria-pressed', String(shown));
    for (const group of this.querySelectorAll<SVGGElement>(`g[data-layer-group="${CSS.escape(layer ?? '')}"]`)) {
      if (shown) group.removeAttribute('display');
      else group.setAttribute('display', 'none');
    }
  }

  /** Draws the standalone SVG file (the figure as first shown, with its own styles) at PNG_SCALE and downloads it. */
  async #exportPng(): Promise<void> {
    const href = this.dataset.svgHref;
    if (!href) return;
    const text = await (await fetch(href)).text();
    const url = URL.createObjectURL(new Blob([text], { type: 'image/svg+xml' }));
    try {
      const image = new Image();
      image.src = url;
      await image.decode();
      const canvas = document.createElement('canvas');
      canvas.width = image.naturalWidth * PNG_SCALE;
      canvas.height = image.naturalHeight * PNG_SCALE;
      const context = canvas.getContext('2d');
      if (!context) return;
      context.drawImage(image, 0, 0, canvas.width, canvas.height);
      const png = await new Promise<Blob | null>((ok) => canvas.toBlob(ok, 'image/png'));
      if (!png) return;
      const link = document.createElement('a');
      link.href = URL.createObjectURL(png);
      link.download = this.dataset.pngName ?? 'figure.png';
      link.click();
      setTimeout(() => URL.revokeObjectURL(link.href), 10_000);
    } finally {
      URL.revokeObjectURL(url);
    }
  }
}

function isIdentity(t: ZoomTransform): boolean {
  return t.k === 1 && t.x === 0 && t.y === 0;
}

if (!customElements.get('plane-figure')) customElements.define('plane-figure', PlaneFigure);
