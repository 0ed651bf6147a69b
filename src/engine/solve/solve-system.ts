import type { PolynomialSystem } from '../expr/node.ts';
import type { PathEnd } from '../homotopy.ts';
import { compiledTarget } from './compiled-target.ts';
import { bezoutBound, multihomogeneousBound } from '../start/bounds.ts';
import { planHomotopy, TRACK_FROM, TRACK_TO, type HomotopyPlan } from '../start/plan.ts';
import { COMPILED_HOMOTOPY_MODULE, createHomotopy } from '../homotopies/compiled-module.ts';
import { trackStarts } from '../pool/track-batch.ts';
import { createTracker } from '../track/tracker.ts';
import { sharedPool } from '../pool/shared-pool.ts';
import type { PathJob } from '../pool/job.ts';
import { createAffineTools, type AffineTools } from './affine.ts';
import { createLocalDimensionTest } from './local-dimension.ts';
import { createRetracker } from './retracker.ts';
import { createExtendedNewton } from './extended-newton.ts';
import { reviewEnd, type PathReviewTools } from './review-ends.ts';
import { recoverJumps } from './jump-review.ts';
import { toAffineEnd } from './affine-end.ts';
import { collectSolutions } from './collect.ts';
import { naturalUnits } from '../start/natural-units.ts';
import type { SolveBounds, SolveOptions, SolveReport } from './types.ts';

export type { FoundSolution, PathStatistics, SolveBounds, SolveOptions, SolveReport } from './types.ts';
export { collectSolutions } from './collect.ts';
export { isRealPoint } from './real.ts';
export { bezoutBound, multihomogeneousBound } from '../start/bounds.ts';

/**
 * Solves a square polynomial system at the given parameter values (packed complex) by a total-degree or
 * multihomogeneous homotopy with the gamma trick in random charts (see planHomotopy), tracking every path of
 * the start system (or one shard of them) in-process or on the shared worker pool. Each end is reviewed
 * (reviewEnd: excess ends, re-tracks of failed and undecided ends); a whole run then recovers path jumps and
 * collects (finishSolve), a shard only collects its own ends (merge them with finishSolve).
 * Same seed ⇒ the same report (apart from `seconds`), with or without workers; shards merge exactly.
 */
export async function solveSystem(system: PolynomialSystem, parameters: Float64Array, options: SolveOptions): Promise<SolveReport> {
  const began = performance.now();
  const kind = options.start ?? 'total-degree';
  const bounds = { bezoutBound: bezoutBound(system), multihomogeneousBound: multihomogeneousBound(system), startSystem: kind };
  const scaling = naturalUnits(system, parameters);
  const plan = planHomotopy(system, parameters, options.seed, kind, scaling);
  const [first, last] = shardRange(plan.count, options.shard);
  const job: PathJob = {
    homotopyModule: COMPILED_HOMOTOPY_MODULE,
    args: plan.args,
    // exact: the source's hash and length, and every fixed parameter value (the compiled code carries no values)
    key: `${hashText(plan.args.source)}:${plan.args.source.length}:${'fixed' in plan.args ? Array.from(plan.args.fixed).join(',') : ''}`,
    n: plan.N,
    starts: plan.starts.slice(2 * plan.N * first, 2 * plan.N * last),
    tStart: TRACK_FROM,
    tEnd: TRACK_TO,
  };
  const workers = options.workers ?? 0;
  let raw: PathEnd[];
  if (workers > 0) raw = await (await sharedPool(workers)).track(job, options.onProgress);
  // in-process: the same homotopy and tracker a worker builds, without importing the module by URL (bundlers)
  else raw = trackStarts(createTracker(createHomotopy(plan.args)), job.starts, TRACK_FROM, TRACK_TO, (done) => options.onProgress?.(done, last - first));
  const review = reviewToolsFor(system, parameters, plan);
  const ends = raw.map((e, k) => reviewEnd(toAffineEnd(e, plan.projectiveGroups, scaling, review.tools), first + k, review));
  const report = options.shard ? collectSolutions(system, parameters, ends, bounds, first) : finishWithReview(system, parameters, ends, bounds, plan, review);
  report.seconds = (performance.now() - began) / 1000;
  return report;
}

/**
 * The last step of a solve, for a single run and for the merge of its shards alike: path-jump recovery over all
 * ends (recoverJumps; the plan is rebuilt from the seed, deterministically), then collectSolutions. `ends` are the
 * reviewed affine ends of every path in path order, as solveSystem (or its shards, concatenated) produced them.
 */
export function finishSolve(system: PolynomialSystem, parameters: Float64Array, ends: readonly PathEnd[], bounds: SolveBounds, seed: number): SolveReport {
  const plan = planHomotopy(system, parameters, seed, bounds.startSystem, naturalUnits(system, parameters));
  if (plan.count !== ends.length) throw new RangeError(`finishSolve: ${ends.length} ends given, the homotopy has ${plan.count} paths`);
  return finishWithReview(system, parameters, [...ends], bounds, plan, reviewToolsFor(system, parameters, plan));
}

function finishWithReview(system: PolynomialSystem, parameters: Float64Array, ends: PathEnd[], bounds: SolveBounds, plan: HomotopyPlan, review: ReturnType<typeof reviewToolsFor>): SolveReport {
  recoverJumps(ends, plan.scaling, review.retrack, (e, k) => reviewEnd(e, k, review), review.extended);
  return collectSolutions(system, parameters, ends, bounds);
}

/** The affine tools, local dimension test and re-tracker of a planned solve. */
function reviewToolsFor(system: PolynomialSystem, parameters: Float64Array, plan: HomotopyPlan): PathReviewTools & { tools: AffineTools } {
  const compiled = compiledTarget(system);
  const tools = createAffineTools(compiled, parameters, plan.scaling);
  return {
    tools,
    retrack: createRetracker(plan, tools),
    localDimension: createLocalDimensionTest(compiled, parameters, plan.scaling, tools),
    extendedNewton: createExtendedNewton(compiled, parameters, plan.scaling),
    condition: (x) => tools.condition(x),
    extended: true,
  };
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
