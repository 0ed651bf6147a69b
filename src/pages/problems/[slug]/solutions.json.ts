import type { APIRoute } from 'astro';
import { problemPaths, type AtlasEntry } from '../../../site/atlas-entries.ts';
import { solutionsDocument } from '../../../site/solutions-export.ts';

/** /problems/<slug>/solutions.json: every instance's solutions, keyed by coordinate name. */
export const getStaticPaths = problemPaths;

export const GET: APIRoute = ({ props }) => {
  const { record, page } = (props as { entry: AtlasEntry }).entry;
  return new Response(JSON.stringify(solutionsDocument(record, page.data.recordVersion), null, 2) + '\n', {
    headers: { 'Content-Type': 'application/json; charset=utf-8' },
  });
};
