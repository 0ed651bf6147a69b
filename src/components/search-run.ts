// Client-side only: one search against the Pagefind index (loaded on first use), its results checked by answersQuery.
import { answersQuery } from '../site/search/relevance.ts';

/** A result as the search UIs show it. */
export interface FoundPage {
  readonly url: string;
  readonly title: string;
  readonly excerpt: string;
  readonly meta: Readonly<Record<string, string>>;
}

interface PagefindData { url: string; content: string; excerpt: string; meta: Record<string, string> }
interface Pagefind {
  init(): Promise<void>;
  debouncedSearch(term: string | null, options: { filters: Record<string, string> }, ms: number): Promise<{ results: { data(): Promise<PagefindData> }[] } | null>;
}

const BUNDLE = '/pagefind/pagefind.js';
let loading: Promise<Pagefind> | null = null;

/** The Pagefind API, imported and initialised once per page. */
export function pagefind(): Promise<Pagefind> {
  loading ??= (import(/* @vite-ignore */ BUNDLE) as Promise<Pagefind>).then(async (pf) => { await pf.init(); return pf; });
  return loading;
}

/**
 * Searches `query` within the index filter values given (words, as indexed), debounced by `ms`: null when a later call
 * superseded this one, else up to `limit` pages that answer every query term (answersQuery), in the index's order.
 * An empty query with no filter finds nothing; an empty query with filters lists every page in them.
 */
export async function searchPages(query: string, filters: Record<string, string>, limit = 20, ms = 150): Promise<FoundPage[] | null> {
  const q = query.trim();
  if (!q && Object.keys(filters).length === 0) return [];
  const pf = await pagefind();
  const found = await pf.debouncedSearch(q || null, { filters }, ms);
  if (!found) return null;
  const out: FoundPage[] = [];
  for (const result of found.results) {
    if (out.length >= limit) break;
    const data = await result.data();
    if (q && !answersQuery(data.content, q)) continue;
    out.push({ url: data.url, title: data.meta.title ?? data.url, excerpt: data.excerpt, meta: data.meta });
  }
  return out;
}
