import { getCollection, type CollectionEntry } from 'astro:content';
import type { SolveRecord } from '../atlas/record.ts';

/** A problem page's prose entry and its solve record, paired by slug. */
export interface AtlasEntry { readonly page: CollectionEntry<'problems'>; readonly record: SolveRecord }

/**
 * Every problem of the content root, sorted by slug. Throws, naming the file, when a page has no record, a record
 * has no page, or the page's frontmatter disagrees with its record (title, family, true count).
 */
export async function atlasEntries(): Promise<AtlasEntry[]> {
  const pages = await getCollection('problems');
  const records = new Map((await getCollection('records')).map((r) => [r.data.slug, r.data]));
  const out = pages.map((page) => {
    const fm = page.data;
    const record = records.get(fm.slug);
    if (!record) throw new Error(`content: problems/${fm.slug}.mdx has no record records/${fm.slug}.json`);
    records.delete(fm.slug);
    const mismatch = (['title', 'family', 'trueCount'] as const).filter((k) => fm[k] !== record[k]);
    if (mismatch.length > 0) {
      throw new Error(`content: problems/${fm.slug}.mdx frontmatter disagrees with its record on ${mismatch.join(', ')}`);
    }
    return { page, record };
  });
  if (records.size > 0) throw new Error(`content: records without a page: ${[...records.keys()].sort().join(', ')}`);
  return out.sort((a, b) => a.record.slug.localeCompare(b.record.slug));
}

/** getStaticPaths for per-problem routes: one path per slug, the entry as props. */
export async function problemPaths(): Promise<{ params: { slug: string }; props: { entry: AtlasEntry } }[]> {
  return (await atlasEntries()).map((entry) => ({ params: { slug: entry.record.slug }, props: { entry } }));
}
