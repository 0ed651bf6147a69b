import { describe, expect, it } from 'vitest';
import { tagGroups } from '../../src/site/tags.ts';
import { problemSummary } from '../../src/site/summary.ts';
import { fixtureRecord } from './fixture-record.ts';

// Grouping rules are our own (common practice, no source).
describe('tagGroups', () => {
  const a = { ...problemSummary(fixtureRecord('two-conics')), title: 'B', tags: ['conics', 'Bézout bound exact'] };
  const b = { ...problemSummary(fixtureRecord('apollonius-circles')), title: 'A', tags: ['circles', 'bezout bound exact'] };
  it('groups problems by tag slug, alphabetically, problems by title', () => {
    const groups = tagGroups([a, b]);
    expect(groups.map((g) => [g.tag, g.href, g.problems.map((p) => p.title)])).toEqual([
      ['Bézout bound exact', '/tags/bezout-bound-exact/', ['A', 'B']],
      ['circles', '/tags/circles/', ['A']],
      ['conics', '/tags/conics/', ['B']],
    ]);
  });
});
