import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { problems } from '../../../generators/problems/index.ts';
import { publishedComparison } from '../../../src/site/group-words.ts';
import type { SolveRecord } from '../../../src/atlas/record.ts';

// Every problem whose definition names a published monodromy group must carry, in its committed record, a group
// computed from random loops that agrees with it. The published groups and their sources sit in the definitions:
// W(E₆), order 51840 (Jordan 1870); Sp(6, F₂), order 1451520 (Jordan 1870; Harris 1979, Duke Math. J. 46); the
// flexes' order 216 (Harris 1979, from memory); S_{d²} for two plane curves (Harris 1979); S₂ for four lines
// (Harris 1979); S₃₂₆₄ for the conics tangent to five conics (Harris 1979), decided by Jordan's theorem.
const withGroup = problems.filter((d) => d.publishedGroup !== undefined).map((d) => ({ slug: d.slug, published: d.publishedGroup! }));

describe('committed records agree with the published monodromy groups', () => {
  it('covers the six published groups of the catalog (27 lines, 28 bitangents, 9 flexes, two curve pairs, four lines, five conics)', () => {
    expect(withGroup.length).toBeGreaterThanOrEqual(7);
  });

  it.each(withGroup)('$slug: the generic instance’s loops match $published.name', ({ slug, published }) => {
    const record = JSON.parse(readFileSync(new URL(`../../../content/records/${slug}.json`, import.meta.url), 'utf8')) as SolveRecord;
    const generic = record.instances.find((i) => i.kind === 'generic');
    expect(generic?.monodromyGroup).toBeDefined();
    expect(publishedComparison(generic!.monodromyGroup!, published)).toBe('match');
  });
});
