import type { APIRoute } from 'astro';
import { atlasEntries, type AtlasEntry } from '../../../site/atlas-entries.ts';
import { readSystems } from '../../../site/sidecar-files.ts';
import { systemText } from '../../../site/system-text.ts';
import { absoluteUrl, problemPath } from '../../../atlas/permalink.ts';

/** /problems/<slug>/system.txt: every instance's polynomial system, parameters substituted, in the plain notation. */
export async function getStaticPaths() {
  return (await atlasEntries()).filter((entry) => readSystems(entry.record.slug) !== null).map((entry) => ({ params: { slug: entry.record.slug }, props: { entry } }));
}

export const GET: APIRoute = ({ props, site }) => {
  const { record, page } = (props as { entry: AtlasEntry }).entry;
  const text = systemText(record, readSystems(record.slug)!, absoluteUrl(problemPath(record.slug), site!), page.data.recordVersion);
  return new Response(text, { headers: { 'Content-Type': 'text/plain; charset=utf-8' } });
};
