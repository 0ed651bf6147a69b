import type { CountSource } from './source.ts';
import { escapeBibtex } from './citation.ts';

type Published = Extract<CountSource, { kind: 'published' }>;

/** The BibTeX key of a published source: first author's surname (letters only, lowercase) and year, e.g. "bashelor2008". */
export function sourceBibtexKey(source: Published): string {
  const surname = (source.authors[0]!.split(/\s+/).at(-1) ?? 'anon').normalize('NFKD').replace(/[^A-Za-z]/g, '').toLowerCase();
  return `${surname || 'anon'}${source.year}`;
}

/**
 * A BibTeX entry for a published source: @article with journal, volume, number and pages, or @book with publisher and
 * address, as far as its bib fields give them (else @misc with the venue as howpublished); authors joined by "and";
 * DOI and URL when known. Fields in fixed order, text escaped (escapeBibtex), page ranges as given ("701--728").
 */
export function sourceBibtex(source: Published): string {
  const bib = source.bib;
  const type = bib?.type ?? 'misc';
  const fields: [string, string | undefined][] = [
    ['author', source.authors.map(escapeBibtex).join(' and ')],
    ['title', `{${escapeBibtex(source.title)}}`],
    ...(bib?.type === 'article'
      ? [['journal', escapeBibtex(bib.journal)], ['volume', bib.volume], ['number', bib.number], ['pages', bib.pages]] as [string, string | undefined][]
      : bib?.type === 'book'
        ? [['publisher', bib.publisher && escapeBibtex(bib.publisher)], ['address', bib.address && escapeBibtex(bib.address)]] as [string, string | undefined][]
        : [['howpublished', escapeBibtex(source.venue)]] as [string, string | undefined][]),
    ['year', String(source.year)],
    ['doi', source.doi],
    ['url', source.url],
  ];
  const body = fields.filter((f): f is [string, string] => f[1] !== undefined).map(([k, v]) => `  ${k.padEnd(9)} = {${v}}`).join(',\n');
  return `@${type}{${sourceBibtexKey(source)},\n${body}\n}`;
}
