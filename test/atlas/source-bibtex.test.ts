import { describe, expect, it } from 'vitest';
import { sourceBibtex, sourceBibtexKey } from '../../src/atlas/source-bibtex.ts';
import type { CountSource } from '../../src/atlas/source.ts';

type Published = Extract<CountSource, { kind: 'published' }>;

// Field names and entry types follow BibTeX's standard styles (Patashnik, BibTeXing, 1988; common practice).
describe('sourceBibtex', () => {
  const article: Published = {
    kind: 'published', authors: ['A. Bashelor', 'A. Ksir', 'W. Traves'], year: 2008, title: 'Enumerative algebraic geometry of conics',
    venue: 'The American Mathematical Monthly 115(8) (2008), 701–728', doi: '10.1080/00029890.2008.11920584',
    bib: { type: 'article', journal: 'The American Mathematical Monthly', volume: '115', number: '8', pages: '701--728' },
  };
  it('writes an @article with the journal fields and the DOI', () => {
    expect(sourceBibtex(article)).toBe([
      '@article{bashelor2008,',
      '  author    = {A. Bashelor and A. Ksir and W. Traves},',
      '  title     = {{Enumerative algebraic geometry of conics}},',
      '  journal   = {The American Mathematical Monthly},',
      '  volume    = {115},',
      '  number    = {8},',
      '  pages     = {701--728},',
      '  year      = {2008},',
      '  doi       = {10.1080/00029890.2008.11920584}',
      '}',
    ].join('\n'));
  });
  it('writes a @book with what is known, and a @misc with the venue when nothing is', () => {
    const book: Published = { kind: 'published', authors: ['J. Plücker'], year: 1839, title: 'Theorie der algebraischen Curven', venue: 'Bonn (1839)', bib: { type: 'book', address: 'Bonn' } };
    expect(sourceBibtex(book)).toMatch(/^@book\{plucker1839,\n {2}author {4}= \{J\. Plücker\},\n.*\n {2}address {3}= \{Bonn\},\n {2}year {6}= \{1839\}\n\}$/);
    const bare: Published = { kind: 'published', authors: ['X. Y'], year: 2000, title: 'T & U', venue: 'Somewhere 1 (2000)' };
    expect(sourceBibtex(bare)).toContain('@misc{y2000,');
    expect(sourceBibtex(bare)).toContain('title     = {{T \\& U}}');
    expect(sourceBibtex(bare)).toContain('howpublished = {Somewhere 1 (2000)}');
  });
  it('keys by the first surname without accents', () => expect(sourceBibtexKey({ ...article, authors: ['O. Hesse'], year: 1844 })).toBe('hesse1844'));
});
