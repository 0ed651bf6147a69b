import { resolve } from 'node:path';
import { canonicalJson } from '../../src/atlas/canonical-json.ts';
import { AtlasError } from '../pipeline/atlas-error.ts';
import { loadTarget, isFileTarget } from '../pipeline/registry.ts';
import { solveShard } from '../pipeline/solve-shard.ts';
import { contentRoot } from '../write/content-paths.ts';
import type { CommandContext } from './context.ts';
import { EXIT } from './exit-codes.ts';
import { integerOption, parseOptions, shardOption } from './parse-options.ts';
import { publish } from '../write/publish.ts';
import { reportPublished } from './report-publish.ts';
import { solveWithProgress } from './run-solve.ts';
import { jsonSummary, shortfallLines, textSummary } from './summary.ts';
import { CLUSTER_OPTIONS, clusterRequest } from '../cluster/cluster-request.ts';
import { clusterJobOf } from '../cluster/cluster-job-of.ts';
import { runOnCluster } from '../cluster/run-on-cluster.ts';
import { realClusterServices } from '../cluster/cluster-services.ts';
import { writeFileAtomic } from '../write/atomic-write.ts';

const USAGE = 'solve <slug | path/to/definition.ts> [--json] [--seed N] [--workers N] [--write [--force]] [--shard k/n --out part.json] [--slurm [--shards N] [--partition P] [--workdir DIR] [--detach]] [--content DIR]';

/**
 * `solve`: solves one problem (registry slug or definition file) and prints a summary; --json prints exactly one
 * JSON object on stdout (the first demo instance). Exits 1 with one line on stderr per instance that found fewer
 * solutions than the published count. Writes content only with --write (through the regression guard; such a
 * record is published, never marked complete); with --shard k/n --out FILE it solves batch k of n and writes a
 * part file for `merge` instead (atomically). With --slurm it runs as a Slurm job array (generators/cluster/): the
 * merged record is kept in the run folder, and published only with --write.
 */
export async function solveCommand(args: readonly string[], ctx: CommandContext): Promise<number> {
  const { values, positionals } = parseOptions(args, {
    json: { type: 'boolean' }, seed: { type: 'string' }, workers: { type: 'string' }, write: { type: 'boolean' },
    force: { type: 'boolean' }, shard: { type: 'string' }, out: { type: 'string' }, ...CLUSTER_OPTIONS,
  }, USAGE);
  if (positionals.length !== 1) throw new AtlasError('input', `solve takes one problem, got ${positionals.length}\nusage: ${USAGE}`);
  const seed = integerOption(values.seed, 'seed');
  const workers = integerOption(values.workers, 'workers', 1);
  const shard = shardOption(values.shard);
  if ((shard === undefined) !== (values.out === undefined)) throw new AtlasError('input', `--shard and --out go together\nusage: ${USAGE}`);
  const target = positionals[0]!;
  const cluster = clusterRequest(values);
  if (cluster) {
    if (shard || values.json) throw new AtlasError('input', `--slurm splits the solve itself: drop --${shard ? 'shard' : 'json'}\nusage: ${USAGE}`);
    const job = await clusterJobOf(target, ctx, { seed, workers, publishTo: values.write ? contentRoot(values.content) : null, force: Boolean(values.force) });
    return runOnCluster(ctx, job, cluster, realClusterServices());
  }
  const loaded = await loadTarget(target, ctx.problemsDir);
  const engine = await ctx.loadEngine();
  if (shard) {
    const part = await solveShard(loaded, isFileTarget(target) ? resolve(target) : target, engine, shard, { seed, workers });
    writeFileAtomic(resolve(values.out!), canonicalJson(part));
    ctx.stderr.write(`wrote batch ${shard.index + 1} of ${shard.count} of ${loaded.definition.slug} to ${values.out}\n`);
    return EXIT.ok;
  }
  const solved = await solveWithProgress(ctx, engine, loaded, { seed, workers });
  if (values.json) ctx.stdout.write(`${JSON.stringify(jsonSummary(solved.record, solved.seconds))}\n`);
  else ctx.stdout.write(textSummary(solved.record, solved.seconds));
  const short = shortfallLines(solved.record);
  for (const line of short) ctx.stderr.write(`${line}\n`);
  const solveCode = short.length > 0 ? EXIT.failed : EXIT.ok;
  if (!values.write) return solveCode;
  const outcome = publish(contentRoot(values.content), solved.record, { force: Boolean(values.force) }, solved.sidecars);
  return Math.max(solveCode, reportPublished(ctx, solved.record.slug, outcome));
}
