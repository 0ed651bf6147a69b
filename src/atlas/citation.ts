/** What a citation of one problem page needs; `date` is the record's latest history date (YYYY-MM-DD), null when it has none. */
export interface CitationInput {
  readonly slug: string;
  readonly title: string;
  readonly url: string;
  readonly recordVersion: number;
  readonly engineVersion: string;
  readonly date: string | null;
}

/** The atlas's name as it appears in citations. */
export const ATLAS_NAME = 'Enumerative Atlas';

/** Stable BibTeX key: "enumatlas:<slug>:v<recordVersion>" (one key per published record version). */
export function citationKey(input: Pick<CitationInput, 'slug' | 'recordVersion'>): string {
  return `enumatlas:${input.slug}:v${input.recordVersion}`;
}

/** Escapes BibTeX's special characters (\ { } $ & % # _ ~ ^) so a title survives LaTeX. */
export function escapeBibtex(text: string): string {
  return text.replace(/[\\{}$&%#_~^]/g, (ch) => {
    if (ch === '\\') return '\\textbackslash{}';
    if (ch === '~') return '\\textasciitilde{}';
    if (ch === '^') return '\\textasciicircum{}';
    return `\\${ch}`;
  });
}

function checkDate(date: string | null): string | null {
  if (date !== null && !/^\d{4}-\d{2}-\d{2}$/.test(date)) throw new Error(`citation: date "${date}" is not YYYY-MM-DD`);
  return date;
}

/** The latest date among history entries (YYYY-MM-DD sorts as text), or null for an empty history. */
export function latestDate(history: readonly { readonly date: string }[]): string | null {
  return history.reduce<string | null>((max, h) => (max === null || h.date > max ? h.date : max), null);
}

/** A BibTeX @misc entry with the permanent URL, the record version and the engine version; fields in fixed order. */
export function bibtexCitation(input: CitationInput): string {
  const date = checkDate(input.date);
  const fields: [string, string][] = [
    ['title', `{${escapeBibtex(input.title)}}`],
    ['author', `{{${ATLAS_NAME} contributors}}`],
    ['howpublished', `{${ATLAS_NAME}, record version ${input.recordVersion}}`],
    ...(date ? [['year', date.slice(0, 4)] as [string, string]] : []),
    ['url', `{${input.url}}`],
    ['note', `{Engine ${escapeBibtex(input.engineVersion)}; ${date ? `record of ${date}` : 'undated record'}}`],
  ];
  const body = fields.map(([k, v]) => `  ${k.padEnd(12)} = ${v}`).join(',\n');
  return `@misc{${citationKey(input)},\n${body}\n}`;
}

/** A one-paragraph plain-text citation with the same facts as the BibTeX entry. */
export function plainCitation(input: CitationInput): string {
  const date = checkDate(input.date);
  return `${ATLAS_NAME} contributors. “${input.title}.” ${ATLAS_NAME}, record version ${input.recordVersion} ` +
    `(engine ${input.engineVersion}), ${date ?? 'undated'}. ${input.url}`;
}
