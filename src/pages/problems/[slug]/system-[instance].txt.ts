import type { APIRoute } from 'astro';
import { atlasEntries, type AtlasEntry } from '../../../site/atlas-entries.ts';
import type { InstanceResult } from '../../../atlas/record.ts';
import { readSystems } from '../../../site/sidecar-files.ts';
import { instanceEquations } from '../../../site/system-text.ts';

/** /problems/<slug>/system-<instance>.txt: one instance's polynomials alone, one per line (what the copy button copies). */
export async function getStaticPaths() {
  return (await atlasEntries()).flatMap((entry) => {
    const systems = readSystems(entry.record.slug);
    return systems ? entry.record.instances.map((instance) => ({ params: { slug: entry.record.slug, instance: instance.id }, props: { entry, instance } })) : [];
  });
}

export const GET: APIRoute = ({ props }) => {
  const { entry, instance } = props as { entry: AtlasEntry; instance: InstanceResult };
  const text = instanceEquations(readSystems(entry.record.slug)!, instance.id);
  if (text === null) throw new Error(`systems/${entry.record.slug}.json has no instance "${instance.id}"`);
  return new Response(text, { headers: { 'Content-Type': 'text/plain; charset=utf-8' } });
};
