import { AtlasError } from './atlas-error.ts';
import type { EngineServices } from './engine-services.ts';
import { displayPath, type LoadedDefinition } from './load-definition.ts';
import type { SolvePartFile } from './part-file.ts';
import { instanceParameters, runEngine, type SolveOptions } from './solve-problem.ts';
import { strategyFor } from './strategy-for.ts';

/** Solves batch `shard.index` of `shard.count` of every instance and returns the part (no certification, no record). */
export async function solveShard(loaded: LoadedDefinition, target: string, engine: EngineServices, shard: { index: number; count: number }, options: SolveOptions = {}): Promise<SolvePartFile> {
  const strategy = strategyFor(loaded.definition, engine, displayPath(loaded.file));
  if (!strategy.shardable) throw new AtlasError('input', `${displayPath(loaded.file)}: solver.kind: "${loaded.definition.solver?.kind}" cannot be split into shards`);
  const instances: SolvePartFile['instances'] = [];
  for (const original of loaded.definition.instances) {
    const instance = options.seed === undefined ? original : { ...original, seed: options.seed };
    const parameters = instanceParameters(loaded, instance);
    const onProgress = options.onProgress && ((p: { done: number; total: number }) => options.onProgress!(instance, p));
    const report = await runEngine(`${displayPath(loaded.file)}: instance "${instance.id}"`, () =>
      strategy.solve(loaded.system, parameters, { seed: instance.seed, workers: options.workers, shard, onProgress }, loaded.definition));
    const ends = report.ends.map((e) => ({ ...e, point: Array.from(e.point, finiteOrNull), residual: finiteOrNull(e.residual), condition: finiteOrNull(e.condition) }));
    instances.push({ id: instance.id, seed: instance.seed, bezoutBound: report.bezoutBound, multihomogeneousBound: report.multihomogeneousBound ?? null, startSystem: report.startSystem === 'multihomogeneous' ? 'multihomogeneous' : 'total-degree', ends });
  }
  return { format: 'atlas-solve-part', formatVersion: 2, target, slug: loaded.definition.slug, definitionHash: loaded.hash, engineVersion: engine.version, shard, instances };
}

function finiteOrNull(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}
