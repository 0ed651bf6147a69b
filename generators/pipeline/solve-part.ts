import { z } from 'astro/zod';
import type { PathEnd } from '../../src/engine/homotopy.ts';
import type { InstanceResult } from '../../src/atlas/record.ts';
import { AtlasError } from './atlas-error.ts';
import { assembleInstance } from './assemble-instance.ts';
import { buildRecord } from './build-record.ts';
import type { EngineServices } from './engine-services.ts';
import { displayPath, type LoadedDefinition } from './load-definition.ts';
import { instanceParameters, runEngine, type SolveOptions, type SolvedProblem } from './solve-problem.ts';
import { strategyFor } from './strategy-for.ts';

/** Non-finite numbers travel as null (JSON has no Infinity); doubles otherwise round-trip exactly. */
const looseNumber = z.number().nullable().transform((v) => v ?? Infinity);

const endSchema = z.object({
  outcome: z.enum(['regular', 'singular', 'at-infinity', 'failed']),
  point: z.array(looseNumber),
  residual: looseNumber,
  condition: looseNumber,
  windingNumber: z.number(),
  steps: z.number(),
  rejectedSteps: z.number(),
  retries: z.number(),
  failure: z.enum(['step-underflow', 'step-budget', 'no-convergence', 'non-finite']).optional(),
});

/**
 * A part file (`solve … --shard k/n --out part.json`): the path ends of batch k of n of every instance, exact
 * doubles, with what identifies the solve (target, definition hash, engine version, seed per instance).
 */
export const partSchema = z.object({
  format: z.literal('atlas-solve-part'),
  formatVersion: z.literal(1),
  target: z.string().min(1),
  slug: z.string(),
  definitionHash: z.string(),
  engineVersion: z.string(),
  shard: z.object({ index: z.number().int().nonnegative(), count: z.number().int().positive() }),
  instances: z.array(z.object({
    id: z.string(),
    seed: z.number().int().nonnegative(),
    bezoutBound: z.number().int().positive(),
    multihomogeneousBound: z.number().int().positive().nullable(),
    startSystem: z.enum(['total-degree', 'multihomogeneous']),
    ends: z.array(endSchema),
  })),
});

/** A parsed part file (non-finite numbers restored to Infinity). */
export type SolvePart = z.output<typeof partSchema>;

/** A part file as written (non-finite numbers as null). */
export type SolvePartFile = z.input<typeof partSchema>;

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
  return { format: 'atlas-solve-part', formatVersion: 1, target, slug: loaded.definition.slug, definitionHash: loaded.hash, engineVersion: engine.version, shard, instances };
}

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
  for (const [j, head] of first.instances.entries()) {
    const known = loaded.definition.instances.find((i) => i.id === head.id);
    if (!known) throw new AtlasError('input', `merge: instance "${head.id}" is not in the definition`);
    const instance = { ...known, seed: head.seed };
    const ends: PathEnd[] = sorted.flatMap((p) => p.instances[j]!.ends.map((e) => ({ ...e, point: Float64Array.from(e.point) })) as PathEnd[]);
    const parameters = instanceParameters(loaded, instance);
    const where = `merge: instance "${instance.id}"`;
    const bounds = { bezoutBound: head.bezoutBound, multihomogeneousBound: head.multihomogeneousBound, startSystem: head.startSystem };
    const report = await runEngine(where, async () => engine.collect(loaded.system, parameters, ends, bounds));
    const run = { definition: loaded.definition, system: loaded.system, instance, seed: head.seed, method: strategy.label, parameters, report, where };
    const done = await runEngine(where, () => assembleInstance(run, engine));
    results.push(done.result);
    seconds.push(done.seconds);
  }
  return { record: buildRecord(loaded, engine.version, results), seconds };
}

function finiteOrNull(x: number): number | null {
  return Number.isFinite(x) ? x : null;
}
