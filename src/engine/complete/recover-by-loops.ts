import type { CompiledEquations } from '../compile/compile-system.ts';
import { createPointIndex } from '../parameter/point-index.ts';
import { randomParameterPoint, type LegTracker } from '../parameter/route.ts';
import type { TrackingPool } from '../pool/job.ts';
import { createRandom } from '../random.ts';
import type { TrackerSettings } from '../track/settings.ts';
import { compiledLegTracker } from './compiled-leg-tracker.ts';
import { triangleLegs, walkLoop } from './loop-walk.ts';
import type { PathCounts } from './path-counts.ts';
import { refineRecovered, type RecoveredSolution } from './recovered.ts';

/** Options of recoverByLoops. */
export interface LoopRecoveryOptions {
  /** Seeds the loop vertices and gammas. Same seed ⇒ same report. */
  readonly seed: number;
  /**
   * Stop after this many loops in a row that found nothing (default 2). Each loop is a fresh random triangle, so two
   * fruitless ones in a row leave little room for a missed orbit reachable by loops (common practice, no source).
   */
  readonly quietLoops?: number;
  /** At most this many loops (default 12). */
  readonly maxLoops?: number;
  /** Leg tracker (e.g. a faster hand-written homotopy module in the same coordinates); default: the compiled system's, over `pool` if given. */
  readonly track?: LegTracker;
  readonly pool?: TrackingPool;
  readonly settings?: Partial<TrackerSettings>;
  /** Relative tolerance for two solutions to be the same (default 1e-8, as point-index.ts). */
  readonly tolerance?: number;
}

/** Per-loop counts of recoverByLoops. */
export interface LoopRecord {
  readonly added: number;
  readonly paths: number;
  readonly failedPaths: number;
  readonly jumps: number;
}

/** What recoverByLoops found, with counts that add up over `perLoop`. */
export interface LoopRecoveryReport extends PathCounts {
  /** 'not-applicable' without parameters; 'saturated' after quietLoops fruitless loops in a row; else 'loop-budget'. */
  readonly verdict: 'not-applicable' | 'saturated' | 'loop-budget';
  readonly seed: number;
  /** Distinct points of the given set (relative tolerance). */
  readonly given: number;
  /** New solutions at the instance, Newton-refined there, sorted by rounded coordinates. */
  readonly recovered: RecoveredSolution[];
  /** New ends that did not refine (residual > 1e-8 or condition > 1e14): reported, not kept. */
  readonly rejected: number;
  readonly loops: number;
  readonly perLoop: readonly LoopRecord[];
}

/**
 * Looks for solutions missing from `solutions` (nonsingular, at `parameters`, packed complex) by monodromy loops
 * (Duff–Hill–Jensen–Lee–Leykin–Sommars, IMA J. Numer. Anal. 39, 2019): each loop p₀ → p₁ → p₂ → p₀ has random
 * complex vertices and its own random gammas; every known solution goes around it, and any end not yet known
 * (relative 1e-8) is added and sent around too. Stops after `quietLoops` fruitless loops in a row or `maxLoops`.
 * Failed routes and jumps are counted; jumped routes are re-tracked with safe settings and dropped if they still meet.
 * `solutions` must be in the coordinates of `compiled` (and of `track`, when given); throws RangeError when it is empty.
 */
export async function recoverByLoops(compiled: CompiledEquations, parameters: Float64Array, solutions: readonly Float64Array[], options: LoopRecoveryOptions): Promise<LoopRecoveryReport> {
  const { n, np } = compiled;
  const tolerance = options.tolerance ?? 1e-8;
  const known = createPointIndex(n, tolerance);
  for (const x of solutions) if (known.find(x) < 0) known.add(x);
  const given = known.size;
  const empty = { seed: options.seed, given, recovered: [], rejected: 0, loops: 0, paths: 0, failedPaths: 0, jumps: 0, unresolvedJumps: 0, perLoop: [] };
  if (np === 0) return { verdict: 'not-applicable', ...empty };
  if (given === 0) throw new RangeError('recoverByLoops needs at least one known solution');
  const random = createRandom(options.seed);
  const track = options.track ?? (await compiledLegTracker(compiled, options.pool, options.settings));
  const quietLoops = options.quietLoops ?? 2, maxLoops = options.maxLoops ?? 12;
  const perLoop: LoopRecord[] = [];
  let quiet = 0, unresolvedJumps = 0;
  while (quiet < quietLoops && perLoop.length < maxLoops) {
    const legs = triangleLegs(parameters, randomParameterPoint(np, random), randomParameterPoint(np, random), random);
    const walk = await walkLoop(track, legs, known, true, tolerance);
    perLoop.push({ added: walk.added.length, paths: walk.paths, failedPaths: walk.failedPaths, jumps: walk.jumps });
    unresolvedJumps += walk.unresolvedJumps;
    quiet = walk.added.length === 0 ? quiet + 1 : 0;
  }
  const { recovered, rejected } = refineRecovered(compiled, parameters, known.points.slice(given));
  const sum = (f: (r: LoopRecord) => number): number => perLoop.reduce((s, r) => s + f(r), 0);
  return {
    verdict: quiet >= quietLoops ? 'saturated' : 'loop-budget',
    ...empty,
    recovered,
    rejected,
    loops: perLoop.length,
    paths: sum((r) => r.paths),
    failedPaths: sum((r) => r.failedPaths),
    jumps: sum((r) => r.jumps),
    unresolvedJumps,
    perLoop,
  };
}
