import { describe, expect, it } from 'vitest';
import { sourceShort, sourceText } from '../../src/site/source-text.ts';
import type { CountSource } from '../../src/atlas/source.ts';

describe('count sources', () => {
  const published: CountSource = { kind: 'published', authors: ['K. Drechsler', 'U. Sterz'], year: 1999, title: 'T', venue: 'V' };
  it('names authors, year, title and venue', () => expect(sourceText(published)).toBe('K. Drechsler, U. Sterz (1999), T, V.'));
  it.each([
    [published, 'Drechsler–Sterz 1999'],
    [{ ...published, authors: ['A. One', 'B. Two', 'C. Three'] }, 'One et al. 1999'],
    [{ kind: 'common-practice' }, 'common practice'],
    [{ kind: 'from-memory', note: 'n' }, 'from memory'],
  ] as [CountSource, string][])('short form of %j is %s', (s, want) => expect(sourceShort(s)).toBe(want));
  it('admits a value recalled from memory', () => {
    expect(sourceText({ kind: 'from-memory', note: 'Schubert 1886' })).toBe('From memory, not re-read: Schubert 1886');
  });
});
