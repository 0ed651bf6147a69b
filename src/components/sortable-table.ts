// Client-side only: makes every table[data-sortable] sortable by its column headings (buttons, aria-sort). Cells
// carry their sort value in data-sort; headings say data-sort-type "number" (empty values last) or "text".
// A first click sorts ascending (numbers and text alike), the next one descending.

function sortBy(table: HTMLTableElement, column: number, type: string, descending: boolean): void {
  const body = table.tBodies[0];
  if (!body) return;
  const value = (row: HTMLTableRowElement) => row.cells[column]?.dataset.sort ?? '';
  const rows = [...body.rows].map((row, k) => ({ row, k, v: value(row) }));
  rows.sort((a, b) => {
    if (type === 'number') {
      if (a.v === '' || b.v === '') return (a.v === '' ? 1 : 0) - (b.v === '' ? 1 : 0) || a.k - b.k;
      return (descending ? -1 : 1) * (Number(a.v) - Number(b.v)) || a.k - b.k;
    }
    return (descending ? -1 : 1) * a.v.localeCompare(b.v) || a.k - b.k;
  });
  body.append(...rows.map((r) => r.row));
}

for (const table of document.querySelectorAll<HTMLTableElement>('table[data-sortable]')) {
  if (table.dataset.sortReady) continue;
  table.dataset.sortReady = 'true';
  const heads = [...table.tHead?.rows[0]?.cells ?? []];
  heads.forEach((th, column) => {
    const button = document.createElement('button');
    button.type = 'button';
    button.textContent = th.textContent;
    button.addEventListener('click', () => {
      const descending = th.getAttribute('aria-sort') === 'ascending';
      for (const other of heads) other.removeAttribute('aria-sort');
      th.setAttribute('aria-sort', descending ? 'descending' : 'ascending');
      sortBy(table, column, th.dataset.sortType ?? 'text', descending);
    });
    th.replaceChildren(button);
  });
}
