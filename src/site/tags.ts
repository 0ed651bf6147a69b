import { slugify, tagPath } from '../atlas/permalink.ts';
import type { ProblemSummary } from './summary.ts';

/** A tag with its page and the problems carrying it (by title). */
export interface TagGroup { readonly tag: string; readonly slug: string; readonly href: string; readonly problems: ProblemSummary[] }

/**
 * Every tag of the problems, alphabetically (case-insensitive), each with its problems by title. Tags whose slugs
 * collide ("Bézout" and "bezout") share one page under the first spelling. Throws on a tag with no letters or digits.
 */
export function tagGroups(problems: readonly ProblemSummary[]): TagGroup[] {
  const groups = new Map<string, { tag: string; problems: ProblemSummary[] }>();
  for (const p of problems) for (const tag of p.tags) {
    const slug = slugify(tag);
    const group = groups.get(slug) ?? { tag, problems: [] };
    if (!group.problems.includes(p)) group.problems.push(p);
    groups.set(slug, group);
  }
  return [...groups].map(([slug, g]) => ({ tag: g.tag, slug, href: tagPath(g.tag), problems: g.problems.sort((a, b) => a.title.localeCompare(b.title)) }))
    .sort((a, b) => a.tag.localeCompare(b.tag, 'en', { sensitivity: 'base' }));
}
