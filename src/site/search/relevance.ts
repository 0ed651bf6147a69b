// Shared by the browser's search UIs: a guard against the index's fallback matches.

/** Lowercase words of a text (letters and digits, accents removed). */
export function wordsOf(text: string): string[] {
  return text.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase().split(/[^\p{L}\p{N}]+/u).filter(Boolean);
}

/** How much of a query term a page word must start with: the whole of a short term, at least 60 % (≥ 3 letters) of a longer one. */
export function neededPrefix(term: string): number {
  return term.length <= 3 ? term.length : Math.max(3, Math.ceil(0.6 * term.length));
}

/**
 * Whether a page's text answers every term of the query: each term needs a page word starting with its first
 * neededPrefix(term) characters. This keeps stemmed and partial matches ("tangency" finds "tangent") and drops pages
 * the index returns only because it shortened a term that matches nothing ("xyzzyq" finding "xy").
 */
export function answersQuery(content: string, query: string): boolean {
  const words = wordsOf(content);
  return wordsOf(query).every((term) => {
    const prefix = term.slice(0, neededPrefix(term));
    return words.some((w) => w.startsWith(prefix));
  });
}
