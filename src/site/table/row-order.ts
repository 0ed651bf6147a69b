// Shared by the build and the browser: ordering, filtering and paging of solution rows.
import type { SolutionRow } from './solution-rows.ts';

/** What the table can sort by: the record index, a coordinate (by real part, then imaginary), or a per-solution figure. */
export type SortKey = 'index' | 'real' | 'certified' | 'residual' | 'condition' | `value-${number}`;

/** Which rows the table shows. */
export type RowFilter = 'all' | 'real' | 'certified';

/** The table's view: filter, sort key and direction. Real solutions first is the default ('real', descending). */
export interface RowView { readonly filter: RowFilter; readonly key: SortKey; readonly descending: boolean }

/** The view a page opens with: every row, real solutions first (proven real before merely real), then by index. */
export const DEFAULT_VIEW: RowView = { filter: 'all', key: 'real', descending: true };

const FILTERS: Readonly<Record<RowFilter, (r: SolutionRow) => boolean>> = {
  all: () => true,
  real: (r) => r.real,
  certified: (r) => r.certified,
};

/** Ascending comparison of one key; ties fall back to the record index so every order is total and stable. */
function compareBy(key: SortKey): (a: SolutionRow, b: SolutionRow) => number {
  if (key === 'index') return () => 0;
  if (key === 'real') return (a, b) => Number(a.real) + Number(a.certifiedReal) - (Number(b.real) + Number(b.certifiedReal));
  if (key === 'certified') return (a, b) => Number(a.certified) - Number(b.certified);
  if (key === 'residual') return (a, b) => a.residual - b.residual;
  // A singular Jacobian (condition null) counts as infinitely ill-conditioned.
  if (key === 'condition') return (a, b) => (a.condition ?? Infinity) - (b.condition ?? Infinity) || 0;
  const j = Number(key.slice('value-'.length));
  return (a, b) => (a.values[j]?.[0] ?? 0) - (b.values[j]?.[0] ?? 0) || (a.values[j]?.[1] ?? 0) - (b.values[j]?.[1] ?? 0);
}

/**
 * The rows a view shows, in its order: filtered, then sorted by the key (descending flips the key only; equal keys
 * keep ascending record index). Infinite conditions sort last ascending. Returns a new array.
 */
export function viewRows(rows: readonly SolutionRow[], view: RowView): SolutionRow[] {
  const by = compareBy(view.key), sign = view.descending ? -1 : 1;
  return rows.filter(FILTERS[view.filter]).sort((a, b) => {
    const c = by(a, b);
    return (Number.isNaN(c) ? 0 : sign * c) || a.index - b.index;
  });
}

/** Rows per page of the solutions table. */
export const PAGE_SIZE = 100;

/** The number of pages `count` rows need (at least 1, so an empty table still has its page). */
export function pageCount(count: number, size = PAGE_SIZE): number {
  return Math.max(1, Math.ceil(count / size));
}

/** The 1-based page that holds the row at 0-based `position`. */
export function pageOfPosition(position: number, size = PAGE_SIZE): number {
  return Math.floor(position / size) + 1;
}

/** The rows of 1-based page `page`. */
export function pageRows<T>(rows: readonly T[], page: number, size = PAGE_SIZE): T[] {
  return rows.slice((page - 1) * size, page * size);
}

/** The page links a pager shows: first, last, and the pages next to `page`, with 'gap' where pages are left out. */
export function pageList(page: number, pages: number): (number | 'gap')[] {
  const wanted = [...new Set([1, page - 1, page, page + 1, pages])].filter((n) => n >= 1 && n <= pages).sort((a, b) => a - b);
  return wanted.flatMap((n, k) => (k > 0 && n - wanted[k - 1]! > 1 ? ['gap' as const, n] : [n]));
}
