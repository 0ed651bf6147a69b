import type { APIRoute } from 'astro';
import { atlasEntries, type AtlasEntry } from '../../../site/atlas-entries.ts';
import { solutionsDocument } from '../../../site/solutions-export.ts';

/** /problems/<slug>/solutions.json: every instance's solutions, keyed by coordinate name. */
export async function getStaticPaths() {
  return (await atlasEntries()).map((entry) => ({ params: { slug: entry.record.slug }, props: { entry } }));
}

export const GET: APIRoute = ({ props }) => {
  const { record, page } = (props as { entry: AtlasEntry }).entry;
  return new Response(JSON.stringify(solutionsDocument(record, page.data.recordVersion), null, 2) + '\n', {
    headers: { 'Content-Type': 'application/json; charset=utf-8' },
  });
};
