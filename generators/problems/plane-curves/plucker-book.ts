import type { CountSource } from '../../../src/atlas/source.ts';

/** Plücker's 1839 book, where the formulas for the class, flexes and bitangents of a plane curve are collected. */
export const pluckerBook = {
  kind: 'published',
  authors: ['J. Plücker'],
  year: 1839,
  title: 'Theorie der algebraischen Curven',
  venue: 'Bonn (1839)',
  bib: { type: 'book', address: 'Bonn' },
} as const satisfies CountSource;
