import { readFileSync } from 'node:fs';
import { parseWith } from '../../src/atlas/read-record.ts';
import { formatIssues } from '../../src/atlas/validation-issue.ts';
import { AtlasError } from '../pipeline/atlas-error.ts';
import { loadTarget } from '../pipeline/registry.ts';
import { mergeParts } from '../pipeline/merge-parts.ts';
import { partSchema, type SolvePart } from '../pipeline/part-file.ts';
import { contentRoot } from '../write/content-paths.ts';
import { publish } from '../write/publish.ts';
import type { CommandContext } from './context.ts';
import { parseOptions } from './parse-options.ts';
import { reportPublished } from './report-publish.ts';
import { EXIT } from './exit-codes.ts';
import { jsonSummary, shortfallLines, textSummary } from './summary.ts';

const USAGE = 'merge <part.json>… [--json] [--force] [--content DIR]';

/**
 * `merge`: joins the part files of a sharded solve (`solve … --shard k/n --out part.json`, any order) into the
 * record a single run gives, prints its summary, and publishes it like `regenerate` (guard, history, --force).
 */
export async function mergeCommand(args: readonly string[], ctx: CommandContext): Promise<number> {
  const { values, positionals } = parseOptions(args, { json: { type: 'boolean' }, force: { type: 'boolean' } }, USAGE);
  if (positionals.length === 0) throw new AtlasError('input', `merge needs the part files\nusage: ${USAGE}`);
  const parts: SolvePart[] = positionals.map((file) => {
    const parsed = parseWith(partSchema, () => JSON.parse(readFileSync(file, 'utf8')));
    if (!parsed.ok) throw new AtlasError('input', formatIssues(file, parsed.issues));
    return parsed.value;
  });
  const loaded = await loadTarget(parts[0]!.target, ctx.problemsDir);
  const solved = await mergeParts(loaded, await ctx.loadEngine(), parts);
  ctx.stdout.write(values.json ? `${JSON.stringify(jsonSummary(solved.record, solved.seconds))}\n` : textSummary(solved.record, solved.seconds));
  const published = reportPublished(ctx, solved.record.slug, publish(contentRoot(values.content), solved.record, { force: Boolean(values.force) }, solved.sidecars));
  const short = shortfallLines(solved.record);
  for (const line of short) ctx.stderr.write(`${line} — published, not as complete\n`);
  return Math.max(published, short.length > 0 ? EXIT.failed : EXIT.ok);
}
