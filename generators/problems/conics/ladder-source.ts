import type { CountSource } from '../../../src/atlas/source.ts';

/**
 * The survey that states both conic ladders (points and lines: 1, 2, 4, 4, 2, 1; points and conics:
 * 1, 6, 36, 184, 816, 3264), with a note on the ladder at hand.
 */
export function conicLadderSource(note: string): CountSource {
  return {
    kind: 'published',
    authors: ['A. Bashelor', 'A. Ksir', 'W. Traves'],
    year: 2008,
    title: 'Enumerative algebraic geometry of conics',
    venue: 'The American Mathematical Monthly 115 (2008), 701–728',
    note,
  };
}
