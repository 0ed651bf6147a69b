import { AtlasError } from '../pipeline/atlas-error.ts';
import { loadRegistry } from '../pipeline/registry.ts';
import { checkContent } from '../write/check-content.ts';
import { contentRoot } from '../write/content-paths.ts';
import type { CommandContext } from './context.ts';
import { EXIT } from './exit-codes.ts';
import { parseOptions } from './parse-options.ts';
import { staleness } from './staleness.ts';

const USAGE = 'check [--content DIR]';

/**
 * `check`: validates every content file (records against the record schema, pages against their frontmatter
 * schema and their record) and every definition of the registry. Exit 3 when content is corrupt, else 2 when a
 * definition is bad, else 0; each problem is named with its file and field. Stale records are noted, not errors.
 */
export async function checkCommand(args: readonly string[], ctx: CommandContext): Promise<number> {
  const { values } = parseOptions(args, {}, USAGE);
  const root = contentRoot(values.content);
  const content = checkContent(root);
  for (const e of content.errors) ctx.stderr.write(`${e}\n`);
  let definitions = 0;
  let definitionError = false;
  try {
    const all = await loadRegistry(ctx.problemsDir);
    definitions = all.length;
    const version = await ctx.engineVersion();
    for (const loaded of all) {
      const state = staleness(root, loaded, version);
      if ('reason' in state) ctx.stderr.write(`note: ${loaded.definition.slug}: stale (${state.reason}); refresh (npm start) will re-solve it\n`);
    }
  } catch (error) {
    if (!(error instanceof AtlasError)) throw error;
    ctx.stderr.write(`${error.message}\n`);
    definitionError = true;
  }
  ctx.stderr.write(`check: ${content.slugs.length} records, ${content.errors.length} content problems; ${definitions} definitions${definitionError ? ' (with errors)' : ''}\n`);
  return content.errors.length > 0 ? EXIT.content : definitionError ? EXIT.input : EXIT.ok;
}
