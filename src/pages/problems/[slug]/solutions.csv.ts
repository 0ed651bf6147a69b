import type { APIRoute } from 'astro';
import { problemPaths, type AtlasEntry } from '../../../site/atlas-entries.ts';
import { solutionsCsv } from '../../../site/solutions-export.ts';

/** /problems/<slug>/solutions.csv: one row per solution, re and im columns per coordinate. */
export const getStaticPaths = problemPaths;

export const GET: APIRoute = ({ props }) => {
  const { record } = (props as { entry: AtlasEntry }).entry;
  return new Response(solutionsCsv(record), { headers: { 'Content-Type': 'text/csv; charset=utf-8' } });
};
