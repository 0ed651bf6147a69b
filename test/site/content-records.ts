import { readdirSync, readFileSync } from 'node:fs';
import { ROOT, testContentDir } from './build-site.ts';

/** Slug, title, true count and tags of every record in the content root the browser tests built (read from its JSON files). */
export function contentRecords(): { slug: string; title: string; trueCount: number | null; tags: string[] }[] {
  const dir = `${testContentDir().replace(/^\.\//, ROOT)}/records`;
  return readdirSync(dir).filter((f) => f.endsWith('.json')).sort().map((f) => {
    const r = JSON.parse(readFileSync(`${dir}/${f}`, 'utf8')) as { slug: string; title: string; trueCount: number | null; tags: string[] };
    return { slug: r.slug, title: r.title, trueCount: r.trueCount, tags: r.tags };
  });
}
