// Client-side only: the <search-page> element. Restores the query and filters from the address (?q=…&family=…),
// searches as the reader types or picks a filter, and keeps the address up to date (replaceState), so a search can
// be shared or kept. Sets data-ready when hydrated and data-searched after each completed search.
import { searchPages, type FoundPage } from './search-run.ts';
import { parseSearchState, searchString, type SearchState } from '../site/search/search-state.ts';
import { SEARCH_FILTERS, type FilterKey } from '../site/search/filter-words.ts';

class SearchPage extends HTMLElement {
  connectedCallback(): void {
    const form = this.querySelector<HTMLFormElement>('form');
    const input = form?.querySelector<HTMLInputElement>('input[name="q"]');
    if (!form || !input) return;
    const selects = SEARCH_FILTERS.map(({ key }) => [key, form.querySelector<HTMLSelectElement>(`select[name="${key}"]`)] as const);
    const restored = parseSearchState(location.search);
    input.value = restored.q;
    for (const [key, select] of selects) if (select) select.value = restored.filters[key] ?? '';
    const state = (): SearchState => ({
      q: input.value,
      filters: Object.fromEntries(selects.flatMap(([key, select]) => (select?.value ? [[key, select.value]] : []))) as Partial<Record<FilterKey, string>>,
    });
    const run = async () => {
      const now = state();
      history.replaceState(null, '', `${location.pathname}${searchString(now)}`);
      const indexed: Record<string, string> = {};
      for (const [key, select] of selects) {
        const value = select?.selectedOptions[0]?.dataset.indexValue;
        if (select?.value && value) indexed[key] = value;
      }
      const found = await searchPages(now.q, indexed, 50);
      if (found === null) return;
      this.#render(found, now);
      this.setAttribute('data-searched', searchString(now));
    };
    form.addEventListener('submit', (e) => { e.preventDefault(); void run(); });
    input.addEventListener('input', () => void run());
    for (const [, select] of selects) select?.addEventListener('change', () => void run());
    this.setAttribute('data-ready', '');
    void run();
  }

  #render(found: FoundPage[], state: SearchState): void {
    const status = this.querySelector('.search-status');
    const list = this.querySelector('.search-results');
    if (!status || !list) return;
    const asked = state.q.trim() || Object.keys(state.filters).length > 0;
    status.textContent = !asked ? '' : found.length === 0 ? 'No problem matches this search.' : `${found.length} ${found.length === 1 ? 'problem matches' : 'problems match'}.`;
    list.replaceChildren(...found.map((page) => {
      const li = document.createElement('li');
      const a = document.createElement('a');
      a.href = page.url;
      a.textContent = page.title;
      const excerpt = document.createElement('p');
      excerpt.innerHTML = page.excerpt;
      const meta = document.createElement('p');
      meta.className = 'result-meta';
      meta.textContent = [page.meta.family, page.meta.count && `true count ${page.meta.count}`].filter(Boolean).join(' · ');
      li.append(a, excerpt, meta);
      return li;
    }));
  }
}

if (!customElements.get('search-page')) customElements.define('search-page', SearchPage);
