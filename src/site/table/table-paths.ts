// Shared by the build and the browser: where an instance's table data and static table pages live.
import { problemPath } from '../../atlas/permalink.ts';

/** The compact rows of one instance, fetched by the browser when the reader sorts, filters or pages. */
export function tableDataPath(slug: string, instance: string): string {
  return `${problemPath(slug)}solutions/${instance}.json`;
}

/** Page `page` (1-based) of an instance's table in the default order: page 1 is the problem page itself. */
export function tablePagePath(slug: string, instance: string, page: number): string {
  return page <= 1 ? `${problemPath(slug)}#solutions-${instance}` : `${problemPath(slug)}solutions/${instance}/${page}/`;
}
