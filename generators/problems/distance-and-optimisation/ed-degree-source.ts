import type { CountSource } from '../../../src/atlas/source.ts';

/** The paper that names and computes the Euclidean distance degree (add a note on the formula used). */
export const euclideanDistanceDegreePaper = {
  kind: 'published',
  authors: ['J. Draisma', 'E. Horobeț', 'G. Ottaviani', 'B. Sturmfels', 'R. R. Thomas'],
  year: 2016,
  title: 'The Euclidean distance degree of an algebraic variety',
  venue: 'Foundations of Computational Mathematics 16(1) (2016), 99–149',
  doi: '10.1007/s10208-014-9240-x',
  bib: { type: 'article', journal: 'Foundations of Computational Mathematics', volume: '16', number: '1', pages: '99--149' },
} as const satisfies CountSource;
