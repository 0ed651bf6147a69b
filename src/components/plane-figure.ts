// Client-side only: the <plane-figure> custom element. The SVG inside is complete without JavaScript; this adds
// pan/zoom (d3-zoom on the <svg>, transform on g.viewport), layer toggle buttons, a shared highlight between a
// solution's drawn items and its row in the table named by data-table, and data-ready when hydrated.
import { select } from 'd3-selection';
import { zoom, zoomIdentity, type ZoomBehavior } from 'd3-zoom';

class PlaneFigure extends HTMLElement {
  #zoom: ZoomBehavior<SVGSVGElement, unknown> | null = null;

  connectedCallback(): void {
    const svg = this.querySelector<SVGSVGElement>('svg');
    const viewport = svg?.querySelector<SVGGElement>('g.viewport');
    if (!svg || !viewport) return;
    const width = svg.viewBox.baseVal.width, height = svg.viewBox.baseVal.height;
    const behaviour = zoom<SVGSVGElement, unknown>()
      .scaleExtent([0.5, 40])
      .extent([[0, 0], [width, height]])
      .on('zoom', (event) => {
        viewport.setAttribute('transform', event.transform.toString());
        this.toggleAttribute('data-zoomed', event.transform.k !== 1 || event.transform.x !== 0 || event.transform.y !== 0);
      });
    select(svg).call(behaviour);
    this.#zoom = behaviour;
    for (const button of this.querySelectorAll<HTMLButtonElement>('button[data-toggle-layer]')) {
      button.addEventListener('click', () => this.#toggle(button));
    }
    this.querySelector<HTMLButtonElement>('button[data-reset-view]')?.addEventListener('click', () => {
      if (this.#zoom) select(svg).call(this.#zoom.transform, zoomIdentity);
    });
    this.#linkTable(svg);
    this.querySelector<HTMLElement>('.figure-tools')?.removeAttribute('hidden');
    this.setAttribute('data-ready', '');
  }

  #linkTable(svg: SVGSVGElement): void {
    const table = this.dataset.table ? document.getElementById(this.dataset.table) : null;
    const focus = (index: string | null) => {
      for (const el of [...this.querySelectorAll('.is-focus'), ...(table?.querySelectorAll('.is-focus') ?? [])]) el.classList.remove('is-focus');
      if (index === null) return;
      const sel = CSS.escape(index);
      for (const el of this.querySelectorAll(`[data-solution="${sel}"]`)) el.classList.add('is-focus');
      table?.querySelector(`tr[data-solution-row="${sel}"]`)?.classList.add('is-focus');
    };
    svg.addEventListener('pointerover', (e) => focus((e.target as Element).closest('[data-solution]')?.getAttribute('data-solution') ?? null));
    svg.addEventListener('pointerleave', () => focus(null));
    for (const row of table?.querySelectorAll<HTMLTableRowElement>('tr[data-solution-row]') ?? []) {
      row.addEventListener('pointerenter', () => focus(row.dataset.solutionRow ?? null));
      row.addEventListener('pointerleave', () => focus(null));
    }
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
}

if (!customElements.get('plane-figure')) customElements.define('plane-figure', PlaneFigure);
