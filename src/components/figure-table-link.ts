// Client-side only: the link between a figure (<plane-figure> or <space-figure>) and its solutions table.

/**
 * Links the items of a figure to the solutions table named by the host's data-table: hovering or focusing a row
 * lights its items (class is-focus), hovering an item lights its row, clicking an item selects it (is-selected) and
 * asks the table to reveal its row. Returns a function that puts the marks back on items the figure has redrawn.
 */
export function linkFigureToTable(host: HTMLElement, svg: SVGSVGElement): () => void {
  const table = host.dataset.table ? document.getElementById(host.dataset.table) : null;
  const current: Record<string, string | null> = { 'is-focus': null, 'is-selected': null };
  const markItems = (cls: string, index: string | null) => {
    if (index === null) return;
    for (const el of host.querySelectorAll(`[data-solution="${CSS.escape(index)}"]`)) el.classList.add(cls);
  };
  const mark = (cls: string, index: string | null) => {
    current[cls] = index;
    for (const el of [...host.querySelectorAll(`.${cls}`), ...(table?.querySelectorAll(`tr.${cls}`) ?? [])]) el.classList.remove(cls);
    if (index === null) return;
    markItems(cls, index);
    table?.querySelector(`tr[data-solution-row="${CSS.escape(index)}"]`)?.classList.add(cls);
  };
  const solutionOf = (target: EventTarget | null) => (target as Element | null)?.closest?.('[data-solution]')?.getAttribute('data-solution') ?? null;
  svg.addEventListener('pointerover', (e) => mark('is-focus', solutionOf(e.target)));
  svg.addEventListener('pointerleave', () => mark('is-focus', null));
  svg.addEventListener('click', (e) => {
    const index = solutionOf(e.target);
    if (index === null) return;
    mark('is-selected', index);
    table?.dispatchEvent(new CustomEvent('solution-reveal', { detail: { index: Number(index) } }));
  });
  if (table) {
    const rowOf = (target: EventTarget | null) => (target as Element | null)?.closest?.('tr[data-solution-row]')?.getAttribute('data-solution-row') ?? null;
    table.addEventListener('pointerover', (e) => mark('is-focus', rowOf(e.target)));
    table.addEventListener('pointerleave', () => mark('is-focus', null));
    table.addEventListener('focusin', (e) => mark('is-focus', rowOf(e.target)));
    table.addEventListener('focusout', () => mark('is-focus', null));
  }
  return () => { for (const [cls, index] of Object.entries(current)) markItems(cls, index); };
}
