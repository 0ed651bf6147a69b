import type { SolveRecord } from '../atlas/record.ts';
import { problemPath } from '../atlas/permalink.ts';

/** A link to another problem page. */
export interface RelatedLink { readonly slug: string; readonly title: string; readonly href: string }

/** The problems related to one page: the rungs of each ladder it is on, the rest of its family, and those with its count. */
export interface RelatedProblems {
  readonly ladders: { readonly id: string; readonly title: string; readonly rungs: (RelatedLink & { readonly rung: number; readonly current: boolean })[] }[];
  readonly family: RelatedLink[];
  readonly sameCount: RelatedLink[];
}

const link = (r: SolveRecord): RelatedLink => ({ slug: r.slug, title: r.title, href: problemPath(r.slug) });
const byTitle = (a: RelatedLink, b: RelatedLink) => a.title.localeCompare(b.title);

/**
 * What to link from a problem page: for each ladder the record is on, every rung (the record's own marked current),
 * from the most points down (rung 5, …, 0); the other problems of its family; and the other problems with the same
 * known true count. Links are sorted by title; a problem shown on a ladder is not repeated in the family list.
 */
export function relatedProblems(all: readonly SolveRecord[], record: SolveRecord): RelatedProblems {
  const ladders = (record.ladders ?? []).map((l) => ({
    id: l.id,
    title: l.title,
    rungs: all.flatMap((r) => (r.ladders ?? []).filter((m) => m.id === l.id).map((m) => ({ ...link(r), rung: m.rung, current: r.slug === record.slug })))
      .sort((a, b) => b.rung - a.rung || a.title.localeCompare(b.title)),
  }));
  const onLadder = new Set(ladders.flatMap((l) => l.rungs.map((r) => r.slug)));
  const others = all.filter((r) => r.slug !== record.slug);
  return {
    ladders,
    family: others.filter((r) => r.family === record.family && !onLadder.has(r.slug)).map(link).sort(byTitle),
    sameCount: record.trueCount === null ? [] : others.filter((r) => r.trueCount === record.trueCount).map(link).sort(byTitle),
  };
}
