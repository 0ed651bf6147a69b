import type { PolynomialSystem } from '../expr/node.ts';
import { compileSystem } from '../compile/compile-system.ts';
import { createPointIndex, type PointIndex } from '../parameter/point-index.ts';
import { randomGamma, type LegTracker } from '../parameter/route.ts';
import { trackRoute } from '../parameter/track-route.ts';
import type { RandomSource } from '../random.ts';
import { sortStartEnds, type FibreAtStart } from './pencil-ends.ts';
import { refineRecovered, type RecoveredSolution } from './recovered.ts';
import type { TracePencil } from './trace-pencil.ts';

/** The complete pencil fibre carried back to λ = 0: where it landed, what it adds to the given set, and what went wrong. */
export interface BackToStart {
  readonly atStart: FibreAtStart;
  readonly recovered: RecoveredSolution[];
  readonly rejected: number;
  /** Given solutions that no end met again. */
  readonly givenMissed: number;
  /** One phrase per fault that forbids 'complete' (empty when there is none). */
  readonly faults: readonly string[];
  readonly paths: number;
  readonly jumps: number;
  readonly duplicates: number;
}

/**
 * Tracks the fibre at λ₁ back to λ = 0 (one gamma-arc leg, jump check of trackRoute), sorts the ends (pencil-ends.ts),
 * matches the s = 0 ends with the given solutions (relative tolerance `same`) and refines the others by Newton on F at
 * p₀ (recovered.ts). Faults: non-regular or unclear ends, ends still coinciding, given solutions not met, new ends that
 * do not refine.
 */
export async function backToStart(
  pencil: TracePencil, track: LegTracker, fibre: readonly Float64Array[], lambda1: Float64Array, random: RandomSource,
  system: PolynomialSystem, parameters: Float64Array, given: PointIndex, same: number,
): Promise<BackToStart> {
  const back = await trackRoute(track, [{ from: lambda1, to: new Float64Array(2), gamma: randomGamma(random) }], fibre, same);
  const { fibre: atStart, affine } = sortStartEnds(pencil, back.ends);
  const met = new Set<number>(), fresh = createPointIndex(pencil.n, same);
  for (const x of affine) {
    const j = given.find(x);
    if (j >= 0) met.add(j);
    else if (fresh.find(x) < 0) fresh.add(x);
  }
  const { recovered, rejected } = refineRecovered(compileSystem(system), parameters, fresh.points);
  const givenMissed = given.size - met.size;
  const faults = [
    atStart.failed > 0 ? `${atStart.failed} paths back to λ = 0 did not end regular` : '',
    atStart.unclear > 0 ? `${atStart.unclear} ends at λ = 0 were neither on s = 0 nor on a·X = 0` : '',
    back.duplicates > 0 ? `${back.duplicates} ends at λ = 0 coincided` : '',
    givenMissed > 0 ? `${givenMissed} given solutions were not met again` : '',
    rejected > 0 ? `${rejected} new ends did not refine` : '',
  ].filter((s) => s !== '');
  return { atStart, recovered, rejected, givenMissed, faults, paths: back.ends.length + back.jumpRetracks, jumps: back.jumpRetracks, duplicates: back.duplicates };
}
