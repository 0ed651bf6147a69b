import type { APIRoute } from 'astro';
import { atlasEntries, type AtlasEntry } from '../../../site/atlas-entries.ts';
import { solutionsCsv } from '../../../site/solutions-export.ts';

/** /problems/<slug>/solutions.csv: one row per solution, re and im columns per coordinate. */
export async function getStaticPaths() {
  return (await atlasEntries()).map((entry) => ({ params: { slug: entry.record.slug }, props: { entry } }));
}

export const GET: APIRoute = ({ props }) => {
  const { record } = (props as { entry: AtlasEntry }).entry;
  return new Response(solutionsCsv(record), { headers: { 'Content-Type': 'text/csv; charset=utf-8' } });
};
