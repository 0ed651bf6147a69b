import type { CountSource } from '../atlas/source.ts';

/** One line naming where a count comes from: "Authors (year), Title, Venue", or the honest admission. */
export function sourceText(source: CountSource): string {
  switch (source.kind) {
    case 'published': {
      const note = source.note ? ` ${source.note}` : '';
      return `${source.authors.join(', ')} (${source.year}), ${source.title}, ${source.venue}.${note}`;
    }
    case 'common-practice':
      return `Common practice, no published source${source.note ? `: ${source.note}` : ''}.`;
    case 'from-memory':
      return `From memory, not re-read: ${source.note}`;
  }
}

/** A short label for the ladder: "Authors year" or "common practice" / "from memory". */
export function sourceShort(source: CountSource): string {
  if (source.kind === 'published') {
    const names = source.authors.map((a) => a.split(/\s+/).at(-1) ?? a);
    const who = names.length > 2 ? `${names[0]} et al.` : names.join('–');
    return `${who} ${source.year}`;
  }
  return source.kind === 'common-practice' ? 'common practice' : 'from memory';
}
