import type { PolynomialSystem } from '../../src/engine/index.ts';
import type { MonodromyGroup } from '../../src/atlas/record.ts';

/** Solution sets up to this size get a monodromy group in a solve (the exact order by Schreier–Sims stops here too). */
export const GROUP_LIMIT = 64;
/** Closed loops wanted per generic instance: two random elements already generate most groups seen here. */
export const GROUP_LOOPS = 8;
/** Loops walked at most to get them (a loop whose routes fail, jump or end off the set closes on nothing). */
export const GROUP_MAX_LOOPS = 40;
/** Cycle types kept in the record (the most frequent first). */
const KEPT_CYCLE_TYPES = 8;

type Engine = Pick<typeof import('../../src/engine/index.ts'), 'compileSystem' | 'monodromyPermutations' | 'describeGroup'>;

/**
 * The monodromy group of a generic instance's solutions (in the system's unknowns, distinct and nonsingular): walks
 * random triangles through the instance's parameters in rounds (round k seeded by seed + k) until GROUP_LOOPS loops
 * closed on the set or GROUP_MAX_LOOPS were walked, and describes the group they generate (exact order up to the engine's limit, Jordan's test, cycle types).
 * Deterministic for a seed. The group is a subgroup of the true one: its order is a lower bound.
 */
export async function monodromyGroupOf(engine: Engine, system: PolynomialSystem, parameters: Float64Array, points: readonly Float64Array[], seed: number): Promise<MonodromyGroup> {
  const compiled = engine.compileSystem(system);
  const permutations: Int32Array[] = [];
  let walked = 0;
  for (let round = 0; permutations.length < GROUP_LOOPS && walked < GROUP_MAX_LOOPS; round++) {
    const loops = Math.min(GROUP_LOOPS - permutations.length, GROUP_MAX_LOOPS - walked);
    const report = await engine.monodromyPermutations(compiled, parameters, points, { seed: seed + round, loops });
    permutations.push(...report.permutations);
    walked += loops;
  }
  const group = engine.describeGroup(permutations, points.length);
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
