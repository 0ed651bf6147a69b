import type { CountSource } from '../../../src/atlas/source.ts';

/**
 * Chasles's first 1864 note in the Comptes Rendus, where the conics of a system with characteristics (μ, ν) that touch
 * a curve of order n and class m are counted as mμ + nν. Volume and year as in the conic ladder's citation; the
 * title and pages are recalled, not re-read (the note says so).
 */
export function classAndOrderSource(note: string): CountSource {
  return {
    kind: 'published',
    authors: ['M. Chasles'],
    year: 1864,
    title: 'Détermination du nombre des sections coniques qui doivent toucher cinq courbes données d’ordre quelconque, ou satisfaire à diverses autres conditions',
    venue: 'Comptes Rendus de l’Académie des Sciences de Paris 58 (1864)',
    bib: { type: 'article', journal: 'Comptes Rendus de l’Académie des Sciences de Paris', volume: '58' },
    note: [
      'The rule: a curve of order n and class m imposes on conics the condition mμ + nν, with μ the conics of a one-parameter system through a point and ν those tangent to a line; Chasles stated it in this note and used it again in "Construction des coniques qui satisfont à cinq conditions", same volume, 297–308.',
      'The note’s title and its pages (222–226) are from memory, not re-read; the volume and year are those of the ladder pages.',
      'The class d(d − 1) of a smooth curve of degree d is Plücker’s (Theorie der algebraischen Curven, Bonn 1839).',
      'For the pencil of conics through 4 points our own check agrees: the pencil maps the curve to a line with degree 2d, and by Riemann–Hurwitz it has 4d + 2g − 2 = d² + d branch points (g = (d − 1)(d − 2)/2), which is m + 2d.',
      note,
    ].join(' '),
  };
}
