import { resolve } from 'node:path';
import type { CommandContext } from '../command/context.ts';
import { AtlasError } from '../pipeline/atlas-error.ts';
import { displayPath } from '../pipeline/load-definition.ts';
import { isFileTarget, loadTarget } from '../pipeline/registry.ts';
import { strategyFor } from '../pipeline/strategy-for.ts';
import type { ClusterJob } from './run-on-cluster.ts';

/**
 * Loads and validates a problem before anything is submitted, and checks that its solver can be split into batches
 * (total-degree and multihomogeneous homotopies can; a parameter homotopy from a stored set cannot yet): otherwise
 * AtlasError('input'). A definition file becomes its absolute path, so every node finds it.
 */
export async function clusterJobOf(target: string, ctx: CommandContext, options: Omit<ClusterJob, 'target' | 'slug'>): Promise<ClusterJob> {
  const loaded = await loadTarget(target, ctx.problemsDir);
  const strategy = strategyFor(loaded.definition, await ctx.loadEngine(), displayPath(loaded.file));
  if (!strategy.shardable) throw new AtlasError('input', `${displayPath(loaded.file)}: solver.kind: "${loaded.definition.solver?.kind}" cannot be split into batches of paths; solve it on one machine`);
  return { ...options, target: isFileTarget(target) ? resolve(target) : target, slug: loaded.definition.slug };
}
