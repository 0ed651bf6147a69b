// Shared by the build (index filter values, select options) and the browser (URL parameters): search filters in words.
import type { Realness } from '../realness.ts';

/** The search filters, in the order the search page shows them, with their labels. */
export const SEARCH_FILTERS = [
  { key: 'family', label: 'Family' },
  { key: 'count', label: 'True count' },
  { key: 'realness', label: 'Real solutions (demo)' },
] as const;

/** A search filter's key. */
export type FilterKey = (typeof SEARCH_FILTERS)[number]['key'];

const REALNESS_WORDS: Readonly<Record<Realness, string>> = {
  'all real found': 'All found solutions real',
  'some real': 'Some solutions real',
  'none real': 'No real solutions',
};

/** A family name in words: hyphens become spaces, first letter capitalised ("plane-curves" → "Plane curves"). */
export function familyWords(family: string): string {
  const words = family.replace(/-/g, ' ');
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** The realness filter value in words. */
export function realnessWords(realness: Realness): string {
  return REALNESS_WORDS[realness];
}

/** The count filter value: the true count's digits, or "unknown". */
export function countValue(count: number | null): string {
  return count === null ? 'unknown' : String(count);
}

/** How a filter value appears in a URL: lowercase words joined by hyphens ("Plane curves" → "plane-curves", "3264" → "3264"). */
export function filterParam(value: string): string {
  return value.normalize('NFKD').replace(/[\u0300-\u036f]/g, '').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '');
}
