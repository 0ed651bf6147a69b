import { describe, expect, it } from 'vitest';
import { absoluteUrl, familyPath, problemPath, slugify } from '../../src/atlas/permalink.ts';

describe('permalinks', () => {
  it.each([
    ['Circles and conics', 'circles-and-conics'],
    ['Schubert calculus', 'schubert-calculus'],
    ['Kinematics: 6R arms', 'kinematics-6r-arms'],
    ['Bézout', 'bezout'],
  ])('slugify(%s) is %s', (t, want) => expect(slugify(t)).toBe(want));
  it('refuses text without letters or digits', () => expect(() => slugify('—')).toThrow(/no letters or digits/));
  it('gives problem pages a trailing slash', () => expect(problemPath('apollonius-circles')).toBe('/problems/apollonius-circles/'));
  it('refuses a malformed slug, naming it', () => expect(() => problemPath('Bad Slug')).toThrow(/"Bad Slug"/));
  it('gives family pages a slug path', () => expect(familyPath('Circles and conics')).toBe('/families/circles-and-conics/'));
  it('makes absolute URLs on the site origin', () => {
    expect(absoluteUrl('/problems/x/', 'https://atlas.enumerative.example')).toBe('https://atlas.enumerative.example/problems/x/');
  });
});
