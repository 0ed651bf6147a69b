import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { canonicalJson } from '../../src/atlas/canonical-json.ts';
import { writeFileAtomic } from '../write/atomic-write.ts';
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

const USAGE = 'merge <part.json>… [--json] [--force] [--record-file FILE] [--unpublished] [--content DIR]';

/**
 * `merge`: joins the part files of a sharded solve (`solve … --shard k/n --out part.json`, any order) into the
 * record a single run gives, prints its summary, and publishes it like `regenerate` (guard, history, --force).
 * --record-file FILE also writes the merged record there (canonical JSON, atomically, history empty); --unpublished
 * skips publishing (then the exit code is 1 only for a shortfall).
 */
export async function mergeCommand(args: readonly string[], ctx: CommandContext): Promise<number> {
  const { values, positionals } = parseOptions(args, { json: { type: 'boolean' }, force: { type: 'boolean' }, 'record-file': { type: 'string' }, unpublished: { type: 'boolean' } }, USAGE);
  if (positionals.length === 0) throw new AtlasError('input', `merge needs the part files\nusage: ${USAGE}`);
  const parts: SolvePart[] = positionals.map((file) => {
    const parsed = parseWith(partSchema, () => JSON.parse(readFileSync(file, 'utf8')));
    if (!parsed.ok) throw new AtlasError('input', formatIssues(file, parsed.issues));
    return parsed.value;
  });
  const loaded = await loadTarget(parts[0]!.target, ctx.problemsDir);
  const solved = await mergeParts(loaded, await ctx.loadEngine(), parts);
  ctx.stdout.write(values.json ? `${JSON.stringify(jsonSummary(solved.record, solved.seconds))}\n` : textSummary(solved.record, solved.seconds));
  if (values['record-file']) writeFileAtomic(resolve(values['record-file']), canonicalJson(solved.record));
  const published = values.unpublished ? EXIT.ok : reportPublished(ctx, solved.record.slug, publish(contentRoot(values.content), solved.record, { force: Boolean(values.force) }, solved.sidecars));
  const short = shortfallLines(solved.record);
  for (const line of short) ctx.stderr.write(`${line}${values.unpublished ? '' : ' — published, not as complete'}\n`);
  return Math.max(published, short.length > 0 ? EXIT.failed : EXIT.ok);
}
