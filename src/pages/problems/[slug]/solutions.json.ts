import type { APIRoute } from 'astro';
import { problemPaths, type AtlasEntry } from '../../../site/atlas-entries.ts';
import { solutionsDocument } from '../../../site/solutions-export.ts';
import { readCertificates } from '../../../site/sidecar-files.ts';

/** /problems/<slug>/solutions.json: every instance's solutions, keyed by coordinate name, with certificate boxes (compact JSON). */
export const getStaticPaths = problemPaths;

export const GET: APIRoute = ({ props }) => {
  const { record, page } = (props as { entry: AtlasEntry }).entry;
  return new Response(JSON.stringify(solutionsDocument(record, page.data.recordVersion, readCertificates(record.slug))) + '\n', {
    headers: { 'Content-Type': 'application/json; charset=utf-8' },
  });
};
