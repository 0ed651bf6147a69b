import type { CountSource } from '../../../src/atlas/source.ts';

import type { LadderMembership } from '../../../src/atlas/ladder-membership.ts';

/**
 * The survey that asks, for p points, l lines and c conics, how many conics pass through the points and touch the
 * lines and conics (its introduction), with a note on the ladder at hand. Volume, issue, pages and DOI were checked
 * against stored copies of the article and of a reference list that cites it (2026-12).
 */
export function conicLadderSource(note: string): CountSource {
  return {
    kind: 'published',
    authors: ['A. Bashelor', 'A. Ksir', 'W. Traves'],
    year: 2008,
    title: 'Enumerative algebraic geometry of conics',
    venue: 'The American Mathematical Monthly 115(8) (2008), 701–728',
    doi: '10.1080/00029890.2008.11920584',
    bib: { type: 'article', journal: 'The American Mathematical Monthly', volume: '115', number: '8', pages: '701--728' },
    note,
  };
}

/** The two conic ladders: conics through p points tangent to 5 − p conics, or to 5 − p lines (p = 5, …, 0). */
export const CONIC_LADDERS = {
  conics: { id: 'conics-through-points-tangent-to-conics', title: 'Conics through p points tangent to 5 − p conics: 1, 6, 36, 184, 816, 3264' },
  lines: { id: 'conics-through-points-tangent-to-lines', title: 'Conics through p points tangent to 5 − p lines: 1, 2, 4, 4, 2, 1' },
} as const;

/** The ladder memberships of the rung with p points: the line ladder, or the conic ladder, or both (p = 5). */
export function conicLadderRungs(points: number, ladders: readonly (keyof typeof CONIC_LADDERS)[]): LadderMembership[] {
  return ladders.map((k) => ({ ...CONIC_LADDERS[k], rung: points }));
}

/** How the conic pages draw: in the plane of the conics itself. */
export const PLANE_PROJECTION = 'Drawn in the (x, y)-plane of the problem itself, with equal scales on both axes.';
