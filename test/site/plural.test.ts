import { describe, expect, it } from 'vitest';
import { countNoun } from '../../src/site/plural.ts';
import { familyWords } from '../../src/site/search/filter-words.ts';

// English plural and capitalisation for labels (common practice, no source).
describe('labels', () => {
  it.each([[0, '0 real solutions'], [1, '1 real solution'], [3264, '3,264 real solutions']])('%d → %s', (n, want) => {
    expect(countNoun(n, 'real solution')).toBe(want);
  });
  it('takes an irregular plural', () => expect(countNoun(2, 'vertex', 'vertices')).toBe('2 vertices'));
  it.each([['circles', 'Circles'], ['plane-curves', 'Plane curves'], ['Circles and conics', 'Circles and conics'], ['', '']])('familyWords(%j) is %j', (f, want) => {
    expect(familyWords(f)).toBe(want);
  });
});
