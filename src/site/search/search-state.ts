// Shared by the build and the browser: the search page's state as URL parameters (q, family, count, realness).
import { SEARCH_FILTERS, type FilterKey } from './filter-words.ts';

/** A query and the filter parameters chosen (URL form, see filterParam); an absent filter is not set. */
export interface SearchState { readonly q: string; readonly filters: Readonly<Partial<Record<FilterKey, string>>> }

/** The state a query string holds (unknown parameters ignored, blank values dropped, q trimmed). */
export function parseSearchState(search: string): SearchState {
  const params = new URLSearchParams(search);
  const filters: Partial<Record<FilterKey, string>> = {};
  for (const { key } of SEARCH_FILTERS) {
    const value = params.get(key)?.trim();
    if (value) filters[key] = value;
  }
  return { q: (params.get('q') ?? '').trim(), filters };
}

/** The query string of a state, parameters in a fixed order (q, family, count, realness), "" when empty. */
export function searchString(state: SearchState): string {
  const params = new URLSearchParams();
  if (state.q.trim()) params.set('q', state.q.trim());
  for (const { key } of SEARCH_FILTERS) if (state.filters[key]) params.set(key, state.filters[key]!);
  const text = params.toString();
  return text ? `?${text}` : '';
}
