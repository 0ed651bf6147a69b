import type { CompiledEquations } from '../compile/compile-system.ts';
import { isPermutation, type Permutation } from '../galois/permutation.ts';
import { createPointIndex } from '../parameter/point-index.ts';
import { randomParameterPoint, type LegTracker } from '../parameter/route.ts';
import type { TrackingPool } from '../pool/job.ts';
import { createRandom } from '../random.ts';
import type { TrackerSettings } from '../track/settings.ts';
import { compiledLegTracker } from './compiled-leg-tracker.ts';
import { triangleLegs, walkLoop } from './loop-walk.ts';

/** Options of monodromyPermutations. */
export interface MonodromyLoopOptions {
  /** Seeds the loop vertices and gammas. Same seed ⇒ same permutations. */
  readonly seed: number;
  /** Loops to walk (each a fresh random triangle through the base parameters). */
  readonly loops: number;
  /** Leg tracker in the coordinates of `solutions`; default: the compiled system's, over `pool` if given. */
  readonly track?: LegTracker;
  readonly pool?: TrackingPool;
  readonly settings?: Partial<TrackerSettings>;
  /** Relative tolerance for an end to be a known solution (default 1e-8, as point-index.ts). */
  readonly tolerance?: number;
  /** Called after each loop with loops done and the total. */
  readonly onLoop?: (done: number, total: number) => void;
}

/** Per loop: the permutation it induced, or why it gave none. */
export type LoopOutcome =
  | { readonly kind: 'permutation'; readonly permutation: Permutation }
  | { readonly kind: 'broken'; readonly failedPaths: number; readonly jumps: number; readonly unknownEnds: number };

/** What the loops did: one outcome per loop, with path counts over all of them. */
export interface MonodromyLoopsReport {
  readonly seed: number;
  readonly degree: number;
  readonly outcomes: readonly LoopOutcome[];
  /** The permutations of the loops that closed cleanly, in loop order. */
  readonly permutations: readonly Permutation[];
  readonly paths: number;
  readonly failedPaths: number;
  readonly jumps: number;
}

/** The sizes a loop walk needs: complex unknowns n (as in the solutions) and complex parameters np. */
export interface LoopShape {
  readonly n: number;
  readonly np: number;
}

/**
 * Monodromy permutations of a solution set (Harris 1979; numerically, Leykin–Sottile, Math. Comp. 78, 2009): every
 * solution at `parameters` is carried around random triangles p → q₁ → q₂ → p (random complex vertices and gammas),
 * and the loop's permutation sends solution i to the solution its route ends at. A loop counts only when every route
 * closes on a regular end that is one of the given solutions (relative `tolerance`) and the map is a bijection;
 * otherwise it is reported 'broken' with the reason's counts and induces nothing (never guessed). The solutions
 * must be distinct, nonsingular and in the coordinates of `compiled` (and of `track`); throws RangeError on an empty
 * set or on two solutions within the tolerance.
 */
export async function monodromyPermutations(compiled: CompiledEquations, parameters: Float64Array, solutions: readonly Float64Array[], options: MonodromyLoopOptions): Promise<MonodromyLoopsReport> {
  const track = options.track ?? (await compiledLegTracker(compiled, options.pool, options.settings));
  return loopPermutations({ n: compiled.n, np: compiled.np }, parameters, solutions, { ...options, track });
}

/**
 * monodromyPermutations over any leg tracker (a family's own homotopy module, say, whose coordinates differ from a
 * compiled system's): `shape` gives the sizes, `options.track` carries the solutions along each leg. Same contract,
 * same loops for the same seed and shape.
 */
export async function loopPermutations(shape: LoopShape, parameters: Float64Array, solutions: readonly Float64Array[], options: Omit<MonodromyLoopOptions, 'track' | 'pool' | 'settings'> & { readonly track: LegTracker }): Promise<MonodromyLoopsReport> {
  const tolerance = options.tolerance ?? 1e-8;
  if (solutions.length === 0) throw new RangeError('monodromyPermutations needs at least one solution');
  const base = createPointIndex(shape.n, tolerance);
  for (const x of solutions) {
    if (base.find(x) >= 0) throw new RangeError('monodromyPermutations: two given solutions coincide within the tolerance');
    base.add(x);
  }
  const random = createRandom(options.seed);
  const track = options.track;
  const outcomes: LoopOutcome[] = [];
  let paths = 0, failedPaths = 0, jumps = 0;
  for (let loop = 0; loop < options.loops; loop++) {
    const legs = triangleLegs(parameters, randomParameterPoint(shape.np, random), randomParameterPoint(shape.np, random), random);
    const walk = await walkLoop(track, legs, base, false, tolerance);
    paths += walk.paths; failedPaths += walk.failedPaths; jumps += walk.jumps;
    const image = walk.routes.map((r) => (r.ok ? base.find(r.via[r.via.length - 1]!) : -1));
    const unknownEnds = walk.routes.filter((r, i) => r.ok && image[i]! < 0).length;
    const broken = walk.failedPaths > 0 || walk.unresolvedJumps > 0 || unknownEnds > 0 || !isPermutation(image);
    outcomes.push(broken
      ? { kind: 'broken', failedPaths: walk.failedPaths, jumps: walk.unresolvedJumps, unknownEnds }
      : { kind: 'permutation', permutation: Int32Array.from(image) });
    options.onLoop?.(loop + 1, options.loops);
  }
  const permutations = outcomes.flatMap((o) => (o.kind === 'permutation' ? [o.permutation] : []));
  return { seed: options.seed, degree: solutions.length, outcomes, permutations, paths, failedPaths, jumps };
}
