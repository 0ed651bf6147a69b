import { describe, expect, it } from 'vitest';
import { byFamily, problemSummary } from '../../src/site/summary.ts';
import { fixtureRecord } from './fixture-record.ts';

describe('problem summaries', () => {
  const apollonius = problemSummary(fixtureRecord('apollonius-circles'));
  const conics = problemSummary(fixtureRecord('two-conics'));
  // Apollonius 8 (Drechsler–Sterz 1999); two conics 4 (Fulton, Algebraic Curves 1969).
  it('summarises with permalinks and the demo counts', () => {
    expect(apollonius).toMatchObject({ href: '/problems/apollonius-circles/', familyHref: '/families/circles-and-conics/', bezout: 8, trueCount: 8, found: 8, real: 8, realness: 'all real found' });
    expect(conics).toMatchObject({ bezout: 4, trueCount: 4 });
  });
  it('groups by family alphabetically', () => {
    expect(byFamily([conics, apollonius]).map((f) => f.family)).toEqual(['Circles and conics', 'Intersections']);
  });
});
