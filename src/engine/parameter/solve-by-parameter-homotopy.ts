import type { PathEnd } from '../homotopy.ts';
import type { PolynomialSystem } from '../expr/node.ts';
import { createRandom } from '../random.ts';
import { bezoutBound, multihomogeneousBound } from '../start/bounds.ts';
import { isRealPoint } from '../solve/real.ts';
import type { FoundSolution, PathStatistics, SolveReport } from '../solve/types.ts';
import { pathStatistics } from '../solve/statistics.ts';
import type { TrackerSettings } from '../track/settings.ts';
import { createPointIndex } from './point-index.ts';
import { createModuleLegTracker, type HomotopyModuleRef } from './module-tracker.ts';
import { routeThrough, randomGamma, type LegTracker } from './route.ts';
import { coincident, duplicateCount, trackRoute } from './track-route.ts';
import { retryInOtherCharts, type AlternateCharts } from './chart-retry.ts';

/** A problem solved from a stored generic solution set. */
export interface ParameterProblem {
  /** The system shown on the page: its Bézout bound is reported, and solutions are given in its unknowns. */
  readonly shown: PolynomialSystem;
  /** The system actually tracked, as a worker-loadable homotopy module (see module-tracker.ts). */
  readonly working: HomotopyModuleRef;
  /** A generic start: its parameters and all its solutions, in the working coordinates (packed complex). */
  readonly start: { readonly parameters: Float64Array; readonly solutions: readonly Float64Array[] };
  /** Maps a working solution to the shown unknowns (packed complex). */
  readonly toShown: (x: Float64Array) => Float64Array;
  /** Whether a shown solution is real (default isRealPoint; a complex chart needs its own test). */
  readonly isReal?: (shown: Float64Array) => boolean;
  /** Other charts in which failed paths are re-tracked (see chart-retry.ts). */
  readonly alternateCharts?: AlternateCharts;
}

/** Options of solveByParameterHomotopy: the seed of the gamma (and detour point), the route, tracker settings and trackers. */
export interface ParameterSolveOptions {
  /** Seeds the route's random parameter point and gammas. Same seed ⇒ same report. */
  readonly seed: number;
  /**
   * 'direct' (default): one gamma-trick arc from the stored start, itself a random complex parameter point, so the
   * arc avoids the discriminant with probability one even for a real target. 'detour': two arcs through a further
   * random complex point; measured on the five-conic problem it doubled the steps (≈ 75 vs 38 per path) and lost
   * 1–2 paths of 3264 to step underflow, so it is kept only as an option.
   */
  readonly route?: 'detour' | 'direct';
  readonly settings?: Partial<TrackerSettings>;
  /** How legs are tracked (a worker-pool LegTracker, say); default: on this thread. */
  readonly track?: LegTracker;
  /** Trackers for the alternate charts' modules (default: on this thread; only failed paths go there). */
  readonly trackerFor?: (ref: HomotopyModuleRef) => Promise<LegTracker>;
}

export type { AlternateCharts } from './chart-retry.ts';

/** SolveReport with the parameter-homotopy start and the jump check's counts. */
export interface ParameterSolveReport extends Omit<SolveReport, 'startSystem'> {
  readonly startSystem: 'parameter-homotopy';
  /** Starts re-tracked with safe settings because two paths met; regular ends still coinciding afterwards. */
  readonly jumpRetracks: number;
  readonly duplicates: number;
  /** Failed paths recovered by re-tracking in an alternate chart. */
  readonly rechartRecovered: number;
}

/**
 * Solves the shown system at `target` (packed complex, the shown system's parameter order) by coefficient-parameter
 * homotopy (Morgan–Sommese, Appl. Math. Comput. 29, 1989) from the stored generic set, with the jump check of
 * trackRoute and, for paths that still fail, re-tracking in alternate charts (chart-retry.ts). Solutions: distinct
 * regular ends (relative tolerance 1e-8; singular ends likewise in `singular`) mapped to the shown unknowns, sorted by
 * their coordinates; residual and condition are the working system's at the end. Bounds are read off `shown`.
 */
export async function solveByParameterHomotopy(problem: ParameterProblem, target: Float64Array, options: ParameterSolveOptions): Promise<ParameterSolveReport> {
  const began = performance.now();
  if (target.length !== problem.start.parameters.length) {
    throw new RangeError(`parameter homotopy: target has ${target.length / 2} complex parameters, the stored start ${problem.start.parameters.length / 2}`);
  }
  const random = createRandom(options.seed);
  const legs = options.route === 'detour'
    ? routeThrough(problem.start.parameters, target, random)
    : [{ from: problem.start.parameters, to: target, gamma: randomGamma(random) }];
  const track = options.track ?? (await createModuleLegTracker(problem.working, options.settings));
  const route = await trackRoute(track, legs, problem.start.solutions);
  if (problem.alternateCharts) {
    // Ends that still coincide after the safe re-track: at least one of them jumped and neither can be trusted, so
    // both count as failed and go to the chart retry below, which accepts only ends distinct from all others.
    for (const i of coincident(route.ends, 1e-8)) route.ends[i] = { ...route.ends[i]!, outcome: 'failed', failure: 'no-convergence' };
  }
  const rechartRecovered = problem.alternateCharts && route.ends.some((e) => e.outcome !== 'regular')
    ? await retryInOtherCharts(problem.working, problem.alternateCharts, legs, problem.start.solutions, route.ends, 2, options.trackerFor)
    : 0;
  const found = collect(route.ends, 'regular', problem.toShown, problem.isReal ?? isRealPoint);
  const singular = collect(route.ends, 'singular', problem.toShown, problem.isReal ?? isRealPoint);
  return {
    bezoutBound: bezoutBound(problem.shown),
    multihomogeneousBound: multihomogeneousBound(problem.shown),
    startSystem: 'parameter-homotopy',
    ends: route.ends,
    solutions: found,
    singular,
    stats: statistics(route.ends),
    seconds: (performance.now() - began) / 1000,
    jumpRetracks: route.jumpRetracks,
    duplicates: duplicateCount(route.ends),
    rechartRecovered,
  };
}

function collect(ends: readonly PathEnd[], outcome: 'regular' | 'singular', toShown: (x: Float64Array) => Float64Array, isReal: (x: Float64Array) => boolean): FoundSolution[] {
  const out: FoundSolution[] = [];
  let index: ReturnType<typeof createPointIndex> | null = null;
  ends.forEach((e, i) => {
    if (e.outcome !== outcome) return;
    index ??= createPointIndex(e.point.length / 2);
    const j = index.find(e.point);
    if (j >= 0) { out[j]!.paths.push(i); out[j]!.multiplicity++; return; }
    index.add(e.point);
    const point = toShown(e.point);
    out.push({ point, residual: e.residual, condition: e.condition, multiplicity: 1, real: isReal(point), paths: [i] });
  });
  // Rounded coordinates are computed on demand: most comparisons are settled by the first one.
  const keys = new Map(out.map((s) => [s, new Array<number | undefined>(s.point.length)]));
  return out.sort((a, b) => compareKeys(a.point, keys.get(a)!, b.point, keys.get(b)!));
}

/**
 * Orders points by their coordinates (re, im, …), each rounded to 9 significant digits so that noise cannot flip the
 * order of distinct points; ka, kb cache the rounded coordinates of a, b (filled as needed).
 */
function compareKeys(a: Float64Array, ka: (number | undefined)[], b: Float64Array, kb: (number | undefined)[]): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) {
    const x = (ka[i] ??= Number(a[i]!.toPrecision(9))), y = (kb[i] ??= Number(b[i]!.toPrecision(9)));
    if (x !== y) return x - y;
  }
  return a.length - b.length;
}


/** Path counts that add up, with the median and largest step counts and the total retries (upper median of steps, as before). */
export function statistics(ends: readonly PathEnd[]): PathStatistics {
  const stats = pathStatistics(ends);
  const steps = ends.map((e) => e.steps).sort((a, b) => a - b);
  return { ...stats, stepsMedian: steps.length ? steps[steps.length >> 1]! : 0 };
}
