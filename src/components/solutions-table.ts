// Client-side only: the <solutions-table> custom element. The static table (one page, real solutions first) and its
// pager links work without JavaScript; this adds sorting by any column, the real/certified filter and paging in
// place (rows fetched once from data-src), a roving focus over the rows (arrow keys), and `solution-reveal` events:
// dispatched on the element with detail { index }, it pages to that solution's row, selects and focuses it.
// Sets data-ready when hydrated.
import { DEFAULT_VIEW, PAGE_SIZE, pageCount, pageList, pageOfPosition, pageRows, viewRows, type RowFilter, type RowView, type SortKey } from '../site/table/row-order.ts';
import { rowCells } from '../site/table/solution-cells.ts';
import { unpackRows, type SolutionRow } from '../site/table/solution-rows.ts';
import { tablePagePath } from '../site/table/table-paths.ts';
import { countNoun } from '../site/plural.ts';

const count = (n: number) => n.toLocaleString('en-US');

class SolutionsTable extends HTMLElement {
  #rows: SolutionRow[] | null = null;
  #loading: Promise<SolutionRow[]> | null = null;
  #view: RowView = DEFAULT_VIEW;
  #page = 1;
  #selected: number | null = null;

  connectedCallback(): void {
    const table = this.querySelector('table');
    if (!table) return;
    this.#page = Number(this.dataset.page ?? '1');
    for (const th of table.querySelectorAll<HTMLTableCellElement>('th[data-sort-key]')) {
      const button = document.createElement('button');
      button.type = 'button';
      button.textContent = th.textContent;
      button.addEventListener('click', () => this.#sort(th.dataset.sortKey as SortKey));
      th.replaceChildren(button);
    }
    for (const radio of this.querySelectorAll<HTMLInputElement>('input[type="radio"]')) {
      radio.addEventListener('change', () => { if (radio.checked) void this.#update({ ...this.#view, filter: radio.value as RowFilter }, 1); });
    }
    this.addEventListener('click', (e) => {
      const link = (e.target as Element).closest<HTMLAnchorElement>('a[data-page-link]');
      if (!link || !this.contains(link)) return;
      e.preventDefault();
      void this.#update(this.#view, Number(link.dataset.pageLink));
    });
    this.addEventListener('keydown', (e) => this.#moveFocus(e));
    this.addEventListener('solution-reveal', (e) => void this.reveal((e as CustomEvent<{ index: number }>).detail.index));
    this.#rovingFocus();
    this.querySelector<HTMLElement>('.table-tools')?.removeAttribute('hidden');
    this.setAttribute('data-ready', '');
  }

  /** Pages to the row of solution `index` (clearing a filter that hides it), selects it and moves focus to it. */
  async reveal(index: number): Promise<void> {
    let row = this.#rowElement(index);
    if (!row) {
      const rows = await this.#data();
      let view = this.#view;
      let position = viewRows(rows, view).findIndex((r) => r.index === index);
      if (position < 0) { view = { ...view, filter: 'all' }; position = viewRows(rows, view).findIndex((r) => r.index === index); }
      if (position < 0) return;
      await this.#update(view, pageOfPosition(position));
      row = this.#rowElement(index);
    }
    this.#selected = index;
    this.#markSelected();
    if (row) {
      this.#rovingFocus(row);
      row.focus({ preventScroll: true });
      row.scrollIntoView({ block: 'nearest' });
    }
  }

  #rowElement(index: number): HTMLTableRowElement | null {
    return this.querySelector<HTMLTableRowElement>(`tbody tr[data-solution-row="${index}"]`);
  }

  #data(): Promise<SolutionRow[]> {
    if (this.#rows) return Promise.resolve(this.#rows);
    this.#loading ??= fetch(this.dataset.src ?? '')
      .then((r) => { if (!r.ok) throw new Error(`${this.dataset.src}: HTTP ${r.status}`); return r.json(); })
      .then((doc: { coordinates: string[]; rows: unknown[][] }) => (this.#rows = unpackRows(doc.rows, doc.coordinates.length)));
    return this.#loading;
  }

  #sort(key: SortKey): void {
    // A new column sorts ascending (real and certified: yes first); the same column again flips the direction.
    const flags = key === 'real' || key === 'certified';
    const descending = this.#view.key === key ? !this.#view.descending : flags;
    void this.#update({ ...this.#view, key, descending }, 1);
  }

  async #update(view: RowView, page: number): Promise<void> {
    this.setAttribute('aria-busy', 'true');
    try {
      const rows = viewRows(await this.#data(), view);
      this.#view = view;
      this.#page = Math.min(Math.max(1, page), pageCount(rows.length));
      this.#render(rows);
    } catch (error) {
      const status = this.querySelector('.pager-status');
      if (status) status.textContent = `The rows could not be loaded (${(error as Error).message}); the downloads hold every solution.`;
    } finally {
      this.removeAttribute('aria-busy');
    }
  }

  #render(rows: SolutionRow[]): void {
    const body = this.querySelector('tbody');
    if (!body) return;
    const shown = pageRows(rows, this.#page);
    body.replaceChildren(...shown.map((r) => {
      const tr = document.createElement('tr');
      tr.dataset.solutionRow = String(r.index);
      tr.dataset.real = String(r.real);
      for (const cell of rowCells(r)) {
        const td = document.createElement('td');
        td.className = cell.className;
        cell.parts.forEach((part, k) => {
          if (k > 0) td.append(' ');
          const span = document.createElement('span');
          span.textContent = part;
          td.append(span);
        });
        tr.append(td);
      }
      return tr;
    }));
    for (const th of this.querySelectorAll<HTMLTableCellElement>('th[data-sort-key]')) {
      if (th.dataset.sortKey === this.#view.key) th.setAttribute('aria-sort', this.#view.descending ? 'descending' : 'ascending');
      else th.removeAttribute('aria-sort');
    }
    this.#renderPager(rows.length, shown.length);
    this.#markSelected();
    this.#rovingFocus();
  }

  #renderPager(total: number, shown: number): void {
    const nav = this.querySelector('nav.pager');
    if (!nav) return;
    const pages = pageCount(total);
    const first = (this.#page - 1) * PAGE_SIZE + 1;
    const what = { all: 'solutions', real: 'real solutions', certified: 'certified solutions' }[this.#view.filter];
    const status = document.createElement('p');
    status.className = 'pager-status';
    status.setAttribute('aria-live', 'polite');
    status.textContent = total === 0
      ? `No ${what} to show.`
      : `Rows ${count(first)}–${count(first + shown - 1)} of ${countNoun(total, what.replace(/s$/, ''), what)}.`;
    const list = document.createElement('ul');
    const slug = this.dataset.slug ?? '', instance = this.dataset.instance ?? '';
    const item = (label: string, page: number | null, current = false) => {
      const li = document.createElement('li');
      if (page === null) {
        const span = document.createElement('span');
        span.textContent = label;
        if (label === '…') span.setAttribute('aria-hidden', 'true'); else span.setAttribute('aria-disabled', 'true');
        li.append(span);
      } else {
        const a = document.createElement('a');
        a.href = tablePagePath(slug, instance, page);
        a.dataset.pageLink = String(page);
        a.textContent = label;
        if (current) a.setAttribute('aria-current', 'page');
        li.append(a);
      }
      list.append(li);
    };
    if (pages > 1) {
      item('Previous', this.#page > 1 ? this.#page - 1 : null);
      for (const n of pageList(this.#page, pages)) item(n === 'gap' ? '…' : String(n), n === 'gap' ? null : n, n === this.#page);
      item('Next', this.#page < pages ? this.#page + 1 : null);
    }
    nav.replaceChildren(status, ...(pages > 1 ? [list] : []));
  }

  #markSelected(): void {
    for (const tr of this.querySelectorAll('tr.is-selected')) tr.classList.remove('is-selected');
    if (this.#selected !== null) this.#rowElement(this.#selected)?.classList.add('is-selected');
  }

  /** One row is in the tab order (the given one, else the selected, else the first); the others are reached by arrows. */
  #rovingFocus(target?: HTMLTableRowElement): void {
    const rows = [...this.querySelectorAll<HTMLTableRowElement>('tbody tr')];
    const active = target ?? (this.#selected !== null ? this.#rowElement(this.#selected) : null) ?? rows[0];
    for (const tr of rows) tr.tabIndex = tr === active ? 0 : -1;
  }

  #moveFocus(e: KeyboardEvent): void {
    const row = (e.target as Element).closest?.('tbody tr');
    if (!(row instanceof HTMLTableRowElement)) return;
    const step = { ArrowDown: 1, ArrowUp: -1 }[e.key];
    const edge = { Home: 'first', End: 'last' }[e.key];
    if (step === undefined && edge === undefined) return;
    const rows = [...this.querySelectorAll<HTMLTableRowElement>('tbody tr')];
    const next = edge === 'first' ? rows[0] : edge === 'last' ? rows.at(-1) : rows[rows.indexOf(row) + step!];
    if (!next) return;
    e.preventDefault();
    this.#rovingFocus(next);
    next.focus();
  }
}

if (!customElements.get('solutions-table')) customElements.define('solutions-table', SolutionsTable);
