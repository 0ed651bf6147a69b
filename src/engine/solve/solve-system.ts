import type { PolynomialSystem } from '../expr/node.ts';
import type { PathEnd } from '../homotopy.ts';
import { compiledTarget } from './compiled-target.ts';
import { bezoutBound, multihomogeneousBound } from '../start/bounds.ts';
import { planHomotopy } from '../start/plan.ts';
import { COMPILED_HOMOTOPY_MODULE, createHomotopy } from '../homotopies/compiled-module.ts';
import { trackStarts } from '../pool/track-batch.ts';
import { createTracker } from '../track/tracker.ts';
import { sharedPool } from '../pool/shared-pool.ts';
import type { PathJob } from '../pool/job.ts';
import { createAffineTools } from './affine.ts';
import { toAffineEnd } from './affine-end.ts';
import { collectSolutions } from './collect.ts';
import type { SolveOptions, SolveReport } from './types.ts';

export type { FoundSolution, PathStatistics, SolveBounds, SolveOptions, SolveReport } from './types.ts';
export { collectSolutions } from './collect.ts';
export { isRealPoint } from './real.ts';
export { bezoutBound, multihomogeneousBound } from '../start/bounds.ts';

/**
 * Solves a square polynomial system at the given parameter values (packed complex) by a total-degree or
 * multihomogeneous homotopy with the gamma trick in random charts (see planHomotopy), tracking every path of
 * the start system (or one shard of them) in-process or on the shared worker pool, then collectSolutions.
 * Same seed ⇒ the same report (apart from `seconds`), with or without workers; shards merge exactly.
 */
export async function solveSystem(system: PolynomialSystem, parameters: Float64Array, options: SolveOptions): Promise<SolveReport> {
  const began = performance.now();
  const kind = options.start ?? 'total-degree';
  const bounds = { bezoutBound: bezoutBound(system), multihomogeneousBound: multihomogeneousBound(system), startSystem: kind };
  const plan = planHomotopy(system, parameters, options.seed, kind);
  const [first, last] = shardRange(plan.count, options.shard);
  const job: PathJob = {
    homotopyModule: COMPILED_HOMOTOPY_MODULE,
    args: plan.args,
    // exact: the source's hash and length, and every fixed parameter value (the compiled code carries no values)
    key: `${hashText(plan.args.source)}:${plan.args.source.length}:${'fixed' in plan.args ? Array.from(plan.args.fixed).join(',') : ''}`,
    n: plan.N,
    starts: plan.starts.slice(2 * plan.N * first, 2 * plan.N * last),
  };
  const workers = options.workers ?? 0;
  let raw: PathEnd[];
  if (workers > 0) raw = await (await sharedPool(workers)).track(job, options.onProgress);
  // in-process: the same homotopy and tracker a worker builds, without importing the module by URL (bundlers)
  else raw = trackStarts(createTracker(createHomotopy(plan.args)), job.starts, 0, 1, (done) => options.onProgress?.(done, last - first));
  const tools = createAffineTools(compiledTarget(system), parameters);
  const ends = raw.map((e) => toAffineEnd(e, plan.projectiveGroups, system.unknowns.length, tools));
  const report = collectSolutions(system, parameters, ends, bounds, first);
  report.seconds = (performance.now() - began) / 1000;
  return report;
}

/** The half-open path range [first, last) of shard index/count over `total` paths (the whole range without a shard). */
export function shardRange(total: number, shard?: { index: number; count: number }): [number, number] {
  if (!shard) return [0, total];
  const { index, count } = shard;
  if (!Number.isInteger(count) || count < 1 || !Number.isInteger(index) || index < 0 || index >= count) {
    throw new RangeError(`shard must have integer 0 ≤ index < count, got index ${index}, count ${count}`);
  }
  return [Math.floor((total * index) / count), Math.floor((total * (index + 1)) / count)];
}

/** FNV-1a 32-bit hash of a string, as 8 hex digits (cache keys only). */
function hashText(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
  return (h >>> 0).toString(16).padStart(8, '0');
}
