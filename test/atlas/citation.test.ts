import { describe, expect, it } from 'vitest';
import { bibtexCitation, citationKey, escapeBibtex, latestDate, plainCitation } from '../../src/atlas/citation.ts';

const input = {
  slug: 'apollonius-circles', title: 'Circles tangent to three circles', url: 'https://atlas.enumerative.example/problems/apollonius-circles/',
  recordVersion: 2, engineVersion: '0.3.1', date: '2026-12-01',
};

// BibTeX @misc layout per Patashnik, "BibTeXing" (1988): entry type, key, field = {value} pairs.
describe('citations', () => {
  it('keys one entry per record version', () => expect(citationKey(input)).toBe('enumatlas:apollonius-circles:v2'));
  it('writes a BibTeX @misc with the permanent URL, record version and year', () => {
    expect(bibtexCitation(input)).toBe([
      '@misc{enumatlas:apollonius-circles:v2,',
      '  title        = {Circles tangent to three circles},',
      '  author       = {{Enumerative Atlas contributors}},',
      '  howpublished = {Enumerative Atlas, record version 2},',
      '  year         = 2026,',
      '  url          = {https://atlas.enumerative.example/problems/apollonius-circles/},',
      '  note         = {Engine 0.3.1; record of 2026-12-01}',
      '}',
    ].join('\n'));
  });
  it('writes the same facts as plain text', () => {
    expect(plainCitation(input)).toBe('Enumerative Atlas contributors. “Circles tangent to three circles.” Enumerative Atlas, ' +
      'record version 2 (engine 0.3.1), 2026-12-01. https://atlas.enumerative.example/problems/apollonius-circles/');
  });
  it('omits the year of an undated record', () => {
    expect(bibtexCitation({ ...input, date: null })).not.toMatch(/year/);
    expect(plainCitation({ ...input, date: null })).toContain('undated');
  });
  it('refuses a malformed date, naming it', () => expect(() => plainCitation({ ...input, date: '1.12.2026' })).toThrow(/"1.12.2026"/));
  it.each([['50% & more', '50\\% \\& more'], ['a_b {c}', 'a\\_b \\{c\\}'], ['x^2~y', 'x\\textasciicircum{}2\\textasciitilde{}y']])(
    'escapes %s', (t, want) => expect(escapeBibtex(t)).toBe(want),
  );
  it('finds the latest history date', () => {
    expect(latestDate([{ date: '2026-11-30' }, { date: '2026-12-01' }, { date: '2026-01-05' }])).toBe('2026-12-01');
    expect(latestDate([])).toBeNull();
  });
});
