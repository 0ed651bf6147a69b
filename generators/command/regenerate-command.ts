import { AtlasError } from '../pipeline/atlas-error.ts';
import { loadRegistry, loadTarget } from '../pipeline/registry.ts';
import { contentRoot } from '../write/content-paths.ts';
import { publish } from '../write/publish.ts';
import type { CommandContext } from './context.ts';
import { eachProblem } from './each-problem.ts';
import { integerOption, parseOptions } from './parse-options.ts';
import { reportPublished } from './report-publish.ts';
import { solveWithProgress } from './run-solve.ts';
import { EXIT } from './exit-codes.ts';
import { shortfallLines, textSummary } from './summary.ts';
import { CLUSTER_OPTIONS, clusterRequest } from '../cluster/cluster-request.ts';
import { clusterJobOf } from '../cluster/cluster-job-of.ts';
import { runOnCluster } from '../cluster/run-on-cluster.ts';
import { realClusterServices } from '../cluster/cluster-services.ts';

const USAGE = 'regenerate [<slug | path/to/definition.ts>… | --all] [--force] [--workers N] [--content DIR]\n       regenerate <slug | path> --slurm [--shards N] [--partition P] [--workdir DIR] [--detach] [--force] [--workers N]';

/**
 * `regenerate`: solves the named problems (or all of the registry) and writes their records and pages, refusing
 * to replace a better published record unless --force. A record that found fewer solutions than the published count
 * is published honestly (never marked complete: its counts say found < true count, its notes say why) and the
 * command says how many are missing and exits 1. Goes on past a failing problem; exits with the worst code.
 * With --slurm (one problem) the solve runs as a Slurm job array whose merge job publishes (generators/cluster/).
 */
export async function regenerateCommand(args: readonly string[], ctx: CommandContext): Promise<number> {
  const { values, positionals } = parseOptions(args, { all: { type: 'boolean' }, force: { type: 'boolean' }, workers: { type: 'string' }, ...CLUSTER_OPTIONS }, USAGE);
  if (Boolean(values.all) === positionals.length > 0) throw new AtlasError('input', `name the problems to regenerate, or --all (not both)\nusage: ${USAGE}`);
  const workers = integerOption(values.workers, 'workers', 1);
  const root = contentRoot(values.content);
  const cluster = clusterRequest(values);
  if (cluster) {
    if (positionals.length !== 1) throw new AtlasError('input', `--slurm runs one problem at a time, got ${values.all ? '--all' : positionals.length}\nusage: ${USAGE}`);
    const job = await clusterJobOf(positionals[0]!, ctx, { workers, publishTo: root, force: Boolean(values.force) });
    return runOnCluster(ctx, job, cluster, realClusterServices());
  }
  const targets: readonly string[] = values.all ? (await loadRegistry(ctx.problemsDir)).map((d) => d.definition.slug) : positionals;
  const engine = await ctx.loadEngine();
  return eachProblem(ctx, targets, async (target) => {
    const loaded = await loadTarget(target, ctx.problemsDir);
    const solved = await solveWithProgress(ctx, engine, loaded, { workers });
    ctx.stdout.write(textSummary(solved.record, solved.seconds));
    const published = reportPublished(ctx, loaded.definition.slug, publish(root, solved.record, { force: Boolean(values.force) }, solved.sidecars));
    const short = shortfallLines(solved.record);
    for (const line of short) ctx.stderr.write(`${line} — published, not as complete\n`);
    return Math.max(published, short.length > 0 ? EXIT.failed : EXIT.ok);
  });
}
