// Client-side only, loaded when the reader first focuses the masthead search: matches listed under the box as they
// type (up to 8), with a link to every result on the search page. Escape closes the list.
import { searchPages, type FoundPage } from './search-run.ts';
import { searchString } from '../site/search/search-state.ts';

const LIMIT = 8;

/** Turns the masthead form into a live search (once per form). */
export function attachLiveSearch(form: HTMLFormElement): void {
  if (form.dataset.live) return;
  form.dataset.live = 'true';
  const input = form.querySelector<HTMLInputElement>('input[name="q"]')!;
  const panel = document.createElement('div');
  panel.className = 'live-results';
  panel.id = 'site-search-results';
  panel.hidden = true;
  const status = document.createElement('p');
  status.className = 'live-status';
  status.setAttribute('role', 'status');
  const list = document.createElement('ul');
  panel.append(status, list);
  form.append(panel);
  input.setAttribute('aria-controls', panel.id);
  const close = () => { panel.hidden = true; };
  const run = async () => {
    const q = input.value.trim();
    if (!q) { close(); return; }
    const found = await searchPages(q, {}, LIMIT + 1);
    if (found === null || input.value.trim() !== q) return;
    render(found, q);
  };
  const render = (found: FoundPage[], q: string) => {
    list.replaceChildren(...found.slice(0, LIMIT).map((page) => {
      const li = document.createElement('li');
      const a = document.createElement('a');
      a.href = page.url;
      const title = document.createElement('strong');
      title.textContent = page.title;
      const excerpt = document.createElement('span');
      excerpt.innerHTML = page.excerpt;
      a.append(title, excerpt);
      li.append(a);
      return li;
    }));
    const all = document.createElement('li');
    const more = document.createElement('a');
    more.href = `/search/${searchString({ q, filters: {} })}`;
    more.className = 'live-more';
    more.textContent = 'All results and filters on the search page';
    all.append(more);
    list.append(all);
    status.textContent = found.length === 0 ? `Nothing matches “${q}”.` : `${found.length > LIMIT ? `First ${LIMIT}` : found.length} ${found.length === 1 ? 'match' : 'matches'}.`;
    panel.hidden = false;
  };
  input.addEventListener('input', () => void run());
  input.addEventListener('keydown', (e) => { if (e.key === 'Escape') close(); });
  form.addEventListener('focusout', (e) => { if (!form.contains(e.relatedTarget as Node | null)) close(); });
  if (input.value.trim()) void run();
}
