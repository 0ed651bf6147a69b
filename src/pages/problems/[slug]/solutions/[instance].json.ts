import type { APIRoute } from 'astro';
import { atlasEntries, type AtlasEntry } from '../../../../site/atlas-entries.ts';
import type { InstanceResult } from '../../../../atlas/record.ts';
import { packRows, solutionRows } from '../../../../site/table/solution-rows.ts';

/** /problems/<slug>/solutions/<instance>.json: one instance's rows, compact, for the table's sorting and paging. */
export async function getStaticPaths() {
  return (await atlasEntries()).flatMap((entry) => entry.record.instances.map((instance) => ({
    params: { slug: entry.record.slug, instance: instance.id }, props: { entry, instance },
  })));
}

export const GET: APIRoute = ({ props }) => {
  const { entry, instance } = props as { entry: AtlasEntry; instance: InstanceResult };
  const doc = { coordinates: entry.record.coordinates, rows: packRows(solutionRows(instance.solutions)) };
  return new Response(JSON.stringify(doc), { headers: { 'Content-Type': 'application/json; charset=utf-8' } });
};
