import type { CountSource } from '../../../src/atlas/source.ts';

/** Schubert's 1886 paper, which counts k-planes meeting general planes (the degree of the Grassmannian). */
export const SCHUBERT_1886: CountSource = {
  kind: 'published',
  authors: ['H. Schubert'],
  year: 1886,
  title: 'Anzahl-Bestimmungen für lineare Räume beliebiger Dimension',
  venue: 'Acta Mathematica 8 (1886), 97–118',
  bib: { type: 'article', journal: 'Acta Mathematica', volume: '8', pages: '97--118' },
  note: 'Schubert counts the linear spaces meeting the right number of general linear spaces; the count is the degree of the Grassmannian, the number of standard Young tableaux of a rectangle (hook length formula; W. Fulton, Young Tableaux, Cambridge University Press 1997), which the generator computes and the tests compare. Volume and pages as the Encyclopedia of Mathematics (article “Schubert calculus”, with its zbMATH link) gives them; no DOI was found.',
};
