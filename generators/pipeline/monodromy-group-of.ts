import type { LegTracker, LoopShape, PolynomialSystem } from '../../src/engine/index.ts';
import type { MonodromyGroup } from '../../src/atlas/record.ts';

/** Solution sets up to this size get the exact order (Schreier–Sims) and GROUP_LOOPS closed loops. */
export const GROUP_LIMIT = 64;
/** Larger sets, up to this size, get Jordan's test only, in rounds of LARGE_ROUND_LOOPS loops (the cost is loops × 3 legs × the set). */
export const LARGE_GROUP_LIMIT = 4000;
/** Closed loops wanted per generic instance: two random elements already generate most groups seen here. */
export const GROUP_LOOPS = 8;
/** Loops walked at most to get them (a loop whose routes fail, jump or end off the set closes on nothing). */
export const GROUP_MAX_LOOPS = 40;
/** Above GROUP_LIMIT: loops per round; rounds stop once the loops prove the full symmetric group. */
export const LARGE_ROUND_LOOPS = 2;
/** Above GROUP_LIMIT: loops walked at most. */
export const LARGE_MAX_LOOPS = 8;
/** Cycle types kept in the record (the most frequent first). */
const KEPT_CYCLE_TYPES = 8;

type Engine = Pick<typeof import('../../src/engine/index.ts'), 'compileSystem' | 'monodromyPermutations' | 'describeGroup'> &
  Partial<Pick<typeof import('../../src/engine/index.ts'), 'sharedPool' | 'loopPermutations'>>;

/**
 * Another base point of the same family to walk the loops from: a stored solution set in a family's own working
 * coordinates with the tracker of its homotopy module (the group does not depend on the base point; the module's
 * random charts carry paths the shown formulation's fixed chart may lose).
 */
export interface LoopBase {
  readonly shape: LoopShape;
  readonly parameters: Float64Array;
  readonly solutions: readonly Float64Array[];
  readonly track: LegTracker;
}

/** Options of monodromyGroupOf: a worker count for the shared tracking pool, or a base of the family's own. */
export interface GroupOptions {
  readonly workers?: number;
  readonly base?: LoopBase;
}

/** Whether a generic instance with this many solutions gets a monodromy group in a solve (2 … LARGE_GROUP_LIMIT). */
export function wantsGroup(solutions: number): boolean {
  return solutions >= 2 && solutions <= LARGE_GROUP_LIMIT;
}

/**
 * The monodromy group of a generic instance's solutions (in the system's unknowns, distinct and nonsingular): walks
 * random triangles through the instance's parameters in rounds (round k seeded by seed + k) and describes the group
 * the closed loops generate. Up to GROUP_LIMIT solutions: until GROUP_LOOPS loops closed or GROUP_MAX_LOOPS were
 * walked (exact order by Schreier–Sims, Jordan's test, cycle types). Above it: rounds of LARGE_ROUND_LOOPS until the
 * loops prove the full symmetric group (Jordan's theorem and an odd loop; Hauenstein–Rodriguez–Sottile 2018) or
 * LARGE_MAX_LOOPS were walked; no order. With `workers`, the routes run on the shared tracking pool (same permutations);
 * with `base`, the loops start there instead of at (parameters, points), tracked by its own tracker.
 * Deterministic for a seed. The group is a subgroup of the true one: its order is a lower bound, 'symmetric' a proof.
 */
export async function monodromyGroupOf(engine: Engine, system: PolynomialSystem, parameters: Float64Array, points: readonly Float64Array[], seed: number, options: GroupOptions = {}): Promise<MonodromyGroup> {
  const { workers, base } = options;
  if (base && base.solutions.length !== points.length) throw new RangeError(`monodromyGroupOf: the loop base holds ${base.solutions.length} solutions, the instance ${points.length}`);
  const compiled = base ? null : engine.compileSystem(system);
  const large = points.length > GROUP_LIMIT;
  const wanted = large ? Infinity : GROUP_LOOPS;
  const most = large ? LARGE_MAX_LOOPS : GROUP_MAX_LOOPS;
  const pool = !base && workers !== undefined && workers > 0 && engine.sharedPool ? await engine.sharedPool(workers) : undefined;
  const permutations: Int32Array[] = [];
  let walked = 0;
  let group = engine.describeGroup(permutations, points.length);
  for (let round = 0; permutations.length < wanted && walked < most; round++) {
    const loops = Math.min(large ? LARGE_ROUND_LOOPS : GROUP_LOOPS - permutations.length, most - walked);
    const report = base && engine.loopPermutations
      ? await engine.loopPermutations(base.shape, base.parameters, base.solutions, { seed: seed + round, loops, track: base.track })
      : await engine.monodromyPermutations(compiled ?? engine.compileSystem(system), parameters, points, { seed: seed + round, loops, ...(pool ? { pool } : {}) });
    permutations.push(...report.permutations);
    walked += loops;
    group = engine.describeGroup(permutations, points.length);
    if (large && group.verdict === 'symmetric') break;
  }
  return {
    seed,
    loops: walked,
    closedLoops: permutations.length,
    degree: points.length,
    order: group.order,
    verdict: group.verdict,
    transitive: group.evidence.transitive,
    primitive: group.evidence.primitive,
    primeCycle: group.evidence.primeCycle?.prime ?? null,
    oddLoop: group.evidence.oddElement !== null,
    cycleTypes: group.cycleTypes.slice(0, KEPT_CYCLE_TYPES).map((c) => ({ type: c.type, count: c.count })),
  };
}
