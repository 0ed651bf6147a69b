import type { PathEnd } from '../../src/engine/index.ts';
import type { InstanceResult } from '../../src/atlas/record.ts';
import { AtlasError } from './atlas-error.ts';
import { assembleInstance } from './assemble-instance.ts';
import { buildRecord } from './build-record.ts';
import type { EngineServices } from './engine-services.ts';
import { displayPath, type LoadedDefinition } from './load-definition.ts';
import type { SolvePart } from './part-file.ts';
import { instanceParameters, runEngine, type SolvedProblem } from './solve-problem.ts';
import { strategyFor } from './strategy-for.ts';
import { problemSidecars, type InstanceSidecar } from './sidecars-of.ts';

/**
 * Merges the parts of one sharded solve into the record a single run gives: checks that the parts agree (target,
 * hash, engine, seeds) and cover batches 1…n once, joins each instance's ends in batch order, and hands them to the
 * engine's collectSolutions, then certifies and assembles as a single run does. Throws AtlasError('input') otherwise.
 */
export async function mergeParts(loaded: LoadedDefinition, engine: EngineServices, parts: readonly SolvePart[]): Promise<SolvedProblem> {
  const first = parts[0];
  if (!first) throw new AtlasError('input', 'merge: no part files given');
  const sorted = [...parts].sort((a, b) => a.shard.index - b.shard.index);
  sorted.forEach((p, k) => {
    const bad = p.slug !== first.slug ? 'slug' : p.definitionHash !== loaded.hash ? 'definition hash (the definition changed since the shards ran)' : p.engineVersion !== engine.version ? 'engine version' : p.shard.count !== first.shard.count ? 'shard count' : p.shard.index !== k ? `batch ${k + 1} of ${first.shard.count} (missing or given twice)` : '';
    if (bad) throw new AtlasError('input', `merge: part ${k + 1} of ${sorted.length} does not match on ${bad}`);
  });
  if (sorted.length !== first.shard.count) throw new AtlasError('input', `merge: ${sorted.length} parts given, but the solve was split into ${first.shard.count}`);
  const strategy = strategyFor(loaded.definition, engine, displayPath(loaded.file));
  const results: InstanceResult[] = [];
  const seconds: number[] = [];
  const sidecars: InstanceSidecar[] = [];
  for (const [j, head] of first.instances.entries()) {
    const known = loaded.definition.instances.find((i) => i.id === head.id);
    if (!known) throw new AtlasError('input', `merge: instance "${head.id}" is not in the definition`);
    const instance = { ...known, seed: head.seed };
    const ends: PathEnd[] = sorted.flatMap((p) => p.instances[j]!.ends.map((e) => ({ ...e, point: Float64Array.from(e.point) })) as PathEnd[]);
    const parameters = instanceParameters(loaded, instance);
    const where = `merge: instance "${instance.id}"`;
    const bounds = { bezoutBound: head.bezoutBound, multihomogeneousBound: head.multihomogeneousBound, startSystem: head.startSystem };
    const report = await runEngine(where, async () => engine.collect(loaded.system, parameters, ends, bounds, head.seed));
    const run = { definition: loaded.definition, system: loaded.system, instance, seed: head.seed, method: strategy.label, parameters, report, where };
    const done = await runEngine(where, () => assembleInstance(run, engine));
    results.push(done.result);
    seconds.push(done.seconds);
    sidecars.push(done.sidecar);
  }
  return { record: buildRecord(loaded, engine.version, results), seconds, sidecars: problemSidecars(loaded.definition.slug, loaded.system, sidecars) };
}
