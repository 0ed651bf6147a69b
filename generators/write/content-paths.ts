import { join, resolve } from 'node:path';

/** The content root: the given folder, else env ATLAS_CONTENT_DIR, else ./content (relative to the working directory). */
export function contentRoot(given?: string, env: Record<string, string | undefined> = process.env): string {
  const dir = given?.trim() || env.ATLAS_CONTENT_DIR?.trim() || 'content';
  return resolve(dir);
}

/** Where a problem's record lives: <root>/records/<slug>.json. */
export function recordPath(root: string, slug: string): string {
  return join(root, 'records', `${slug}.json`);
}

/** Where a problem's page lives: <root>/problems/<slug>.mdx. */
export function pagePath(root: string, slug: string): string {
  return join(root, 'problems', `${slug}.mdx`);
}

/** Where a problem's expanded system lives, beside its record: <root>/systems/<slug>.json. */
export function systemsPath(root: string, slug: string): string {
  return join(root, 'systems', `${slug}.json`);
}

/** Where a problem's certificate boxes live, beside its record: <root>/certificates/<slug>.json. */
export function certificatesPath(root: string, slug: string): string {
  return join(root, 'certificates', `${slug}.json`);
}

/** Where a problem's real-solution exploration lives: <root>/explorations/<slug>.json. */
export function explorationPath(root: string, slug: string): string {
  return join(root, 'explorations', `${slug}.json`);
}
