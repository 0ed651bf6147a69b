import { describe, expect, it } from 'vitest';
import { parseSearchState, searchString } from '../../../src/site/search/search-state.ts';
import { countValue, familyWords, filterParam, realnessWords } from '../../../src/site/search/filter-words.ts';
import { answersQuery, neededPrefix } from '../../../src/site/search/relevance.ts';

// URL and filter conventions are our own (common practice, no source).
describe('search state in the URL', () => {
  it.each([
    ['?q=tangent', { q: 'tangent', filters: {} }],
    ['?q=nine+flexes&family=plane-curves', { q: 'nine flexes', filters: { family: 'plane-curves' } }],
    ['?family=conics&count=3264&realness=some-solutions-real&x=1', { q: '', filters: { family: 'conics', count: '3264', realness: 'some-solutions-real' } }],
    ['?q=%20&family=', { q: '', filters: {} }],
  ])('reads %s', (search, state) => expect(parseSearchState(search)).toEqual(state));
  it('writes parameters in a fixed order and round-trips', () => {
    const state = { q: 'tangent circles', filters: { realness: 'all-found-solutions-real', family: 'circles' } };
    expect(searchString(state)).toBe('?q=tangent+circles&family=circles&realness=all-found-solutions-real');
    expect(parseSearchState(searchString(state))).toEqual(state);
    expect(searchString({ q: ' ', filters: {} })).toBe('');
  });
});

describe('filter values in words', () => {
  it('names families, realness and counts in words, with URL forms', () => {
    expect(familyWords('plane-curves')).toBe('Plane curves');
    expect(realnessWords('some real')).toBe('Some solutions real');
    expect(countValue(null)).toBe('unknown');
    expect(filterParam('Plane curves')).toBe('plane-curves');
    expect(filterParam(realnessWords('all real found'))).toBe('all-found-solutions-real');
  });
});

describe('answersQuery', () => {
  const flexes = 'Flexes of a plane cubic. The true count is 9 (nine). A tangent line meets the curve three times.';
  it.each([
    ['nine flexes', true],
    ['flex', true],
    ['tangency', true],
    ['xyzzyq', false],
    ['nine circles', false],
    ['', true],
  ])('"%s" → %s', (q, want) => expect(answersQuery(flexes, q)).toBe(want));
  it.each([['ab', 2], ['nine', 3], ['tangency', 5], ['xyzzyq', 4]])('needs %s to match %d letters', (t, n) => expect(neededPrefix(t)).toBe(n));
});
