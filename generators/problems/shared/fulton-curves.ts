import type { CountSource } from '../../../src/atlas/source.ts';

/** Fulton's textbook on plane algebraic curves, the source cited for Bézout's theorem in the plane (add a note). */
export const fultonCurves = {
  kind: 'published',
  authors: ['W. Fulton'],
  year: 1969,
  title: 'Algebraic Curves: An Introduction to Algebraic Geometry',
  venue: 'W. A. Benjamin (1969); the author’s free electronic edition of 2008 is linked',
  url: 'https://dept.math.lsa.umich.edu/~wfulton/CurveBook.pdf',
  bib: { type: 'book', publisher: 'W. A. Benjamin' },
} as const satisfies CountSource;
