/** The content root the build reads: env ATLAS_CONTENT_DIR (relative to the project root, or absolute), else ./content. */
export function contentDir(env: Record<string, string | undefined> = process.env): string {
  const dir = env.ATLAS_CONTENT_DIR?.trim();
  return (dir && dir.length > 0 ? dir : './content').replace(/\/+$/, '');
}
