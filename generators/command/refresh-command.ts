import { loadRegistry } from '../pipeline/registry.ts';
import type { EngineServices } from '../pipeline/engine-services.ts';
import { contentRoot } from '../write/content-paths.ts';
import { publish, writePage } from '../write/publish.ts';
import type { CommandContext } from './context.ts';
import { eachProblem } from './each-problem.ts';
import { integerOption, parseOptions } from './parse-options.ts';
import { reportPublished } from './report-publish.ts';
import { solveWithProgress } from './run-solve.ts';
import { staleness } from './staleness.ts';

const USAGE = 'refresh [--workers N] [--content DIR]';

/**
 * `refresh` (run by `npm start`): re-solves only stale problems of the registry (no record, unreadable record,
 * definition hash or engine version changed) and rewrites a fresh problem's page only if its bytes differ.
 * Loads the engine only when something is stale, so it is quick when nothing is.
 */
export async function refreshCommand(args: readonly string[], ctx: CommandContext): Promise<number> {
  const { values } = parseOptions(args, { workers: { type: 'string' } }, USAGE);
  const workers = integerOption(values.workers, 'workers', 1);
  const root = contentRoot(values.content);
  const version = await ctx.engineVersion();
  const all = await loadRegistry(ctx.problemsDir);
  let engine: EngineServices | undefined;
  let solved = 0;
  const code = await eachProblem(ctx, all, async (loaded) => {
    const state = staleness(root, loaded, version);
    if ('record' in state) {
      if (writePage(root, state.record)) ctx.stderr.write(`${loaded.definition.slug}: page rewritten from its record\n`);
      return 0;
    }
    ctx.stderr.write(`${loaded.definition.slug}: stale (${state.reason}); solving\n`);
    engine ??= await ctx.loadEngine();
    const result = await solveWithProgress(ctx, engine, loaded, { workers });
    solved++;
    return reportPublished(ctx, loaded.definition.slug, publish(root, result.record, {}, result.sidecars));
  });
  ctx.stderr.write(`refresh: ${all.length} problems, ${solved} re-solved, ${all.length - solved} fresh\n`);
  return code;
}
