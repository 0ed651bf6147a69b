import type { ProblemSummary } from '../summary.ts';
import { countValue, familyWords, filterParam, realnessWords, type FilterKey } from './filter-words.ts';

/** One choice of a search filter: its URL parameter, the value as indexed (words), and its label with the number of problems. */
export interface FilterOption { readonly param: string; readonly value: string; readonly label: string }

/**
 * The choices of every search filter, from the problems themselves: families and realness alphabetically, counts
 * numerically (unknown last); each label says how many problems it holds. The indexed values are the same words
 * the problem pages give the index (familyWords, countValue, realnessWords).
 */
export function searchFilterOptions(problems: readonly ProblemSummary[]): Record<FilterKey, FilterOption[]> {
  const tally = (values: string[], label: (v: string) => string, order: (a: string, b: string) => number): FilterOption[] => {
    const counts = new Map<string, number>();
    for (const v of values) counts.set(v, (counts.get(v) ?? 0) + 1);
    return [...counts.keys()].sort(order).map((v) => ({ param: filterParam(v), value: v, label: `${label(v)} (${counts.get(v)})` }));
  };
  const byText = (a: string, b: string) => a.localeCompare(b);
  const byNumber = (a: string, b: string) => (Number(a) || Infinity) - (Number(b) || Infinity) || byText(a, b);
  return {
    family: tally(problems.map((p) => familyWords(p.family)), (v) => v, byText),
    count: tally(problems.map((p) => countValue(p.trueCount)), (v) => (v === 'unknown' ? 'unknown' : Number(v).toLocaleString('en-US')), byNumber),
    realness: tally(problems.map((p) => realnessWords(p.realness)), (v) => v, byText),
  };
}
