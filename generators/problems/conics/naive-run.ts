import type { PathEnd } from '../../../src/engine/homotopy.ts';
import type { ProblemDefinition } from '../../../src/atlas/definition.ts';
import { systemOf } from '../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../src/atlas/parameters-of.ts';
import { solveSystem } from '../../../src/engine/solve/solve-system.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { createAffineTools } from '../../../src/engine/solve/affine.ts';
import { createPointIndex } from '../../../src/engine/parameter/point-index.ts';

/** Where the paths of the naive total-degree run on the sextic formulation ended (they add up to `paths`). */
export interface NaiveRunSummary {
  readonly slug: string;
  readonly instance: string;
  readonly seed: number;
  readonly bezoutBound: number;
  readonly paths: number;
  /** Distinct nonsingular conics found, and the paths that reached them. */
  readonly genuine: number;
  readonly genuinePaths: number;
  /** Of those, paths the tracker labelled singular whose end refines by Newton's method to a nonsingular conic. */
  readonly relabelledPaths: number;
  /** Other paths ending (singular, at infinity of the chart, or failed) at a double line: rank-one conic matrix. */
  readonly doubleLinePaths: number;
  /** Paths ending elsewhere (neither a nonsingular conic nor a double line): should be 0. */
  readonly otherPaths: number;
  readonly failedPaths: number;
  readonly stepsMedian: number;
  readonly seconds: number;
  /** The rank-one test: largest 2×2 minor of the conic matrix ≤ this × (largest entry)². */
  readonly rankOneTolerance: number;
}

/** max |2×2 minor| / max |entry|² of the symmetric conic matrix of a packed complex (a, …, f): 0 exactly on double lines. */
export function rankOneDefect(x: Float64Array): number {
  const c = (k: number, s = 1): [number, number] => [s * x[2 * k]!, s * x[2 * k + 1]!];
  const m: [number, number][][] = [[c(0), c(1, 0.5), c(3, 0.5)], [c(1, 0.5), c(2), c(4, 0.5)], [c(3, 0.5), c(4, 0.5), c(5)]];
  let minor = 0, entry = 0;
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) entry = Math.max(entry, Math.hypot(...m[i]![j]!));
  for (const [r0, r1] of [[0, 1], [0, 2], [1, 2]]) for (const [c0, c1] of [[0, 1], [0, 2], [1, 2]]) {
    const [ar, ai] = m[r0!]![c0!]!, [br, bi] = m[r1!]![c1!]!, [cr, ci] = m[r0!]![c1!]!, [dr, di] = m[r1!]![c0!]!;
    minor = Math.max(minor, Math.hypot(ar * br - ai * bi - (cr * dr - ci * di), ar * bi + ai * br - (cr * di + ci * dr)));
  }
  return entry === 0 ? Infinity : minor / (entry * entry);
}

/**
 * Runs the naive total-degree homotopy on a conic problem's shown (sextic) formulation at one instance, on `workers`
 * workers, and classifies every path: nonsingular conic (a non-regular end counts when Newton's method refines it to a
 * nonsingular conic, condition < 1e10), double line (rank-one matrix, the excess component), or other.
 */
export async function naiveRun(definition: ProblemDefinition, instanceId: string, seed: number, workers: number, rankOneTolerance = 1e-4): Promise<NaiveRunSummary> {
  const instance = definition.instances.find((i) => i.id === instanceId);
  if (!instance) throw new Error(`problem "${definition.slug}": no instance "${instanceId}"`);
  const system = systemOf(definition), parameters = parametersOf(definition, instance);
  const report = await solveSystem(system, parameters, { seed, start: 'total-degree', workers });
  const tools = createAffineTools(compileSystem(system), parameters);
  const conics = createPointIndex(system.unknowns.length);
  report.solutions.forEach((s) => conics.add(s.point));
  const regularPaths = new Set(report.solutions.flatMap((x) => x.paths));
  let genuinePaths = regularPaths.size, relabelledPaths = 0, doubleLinePaths = 0, otherPaths = 0;
  report.ends.forEach((e: PathEnd, i) => {
    if (regularPaths.has(i)) return;
    if (rankOneDefect(e.point) <= rankOneTolerance) { doubleLinePaths++; return; }
    const x = e.point.slice();
    if (e.outcome !== 'failed' && tools.newton(x, 1e-13, 8) && tools.condition(x) < 1e10 && rankOneDefect(x) > rankOneTolerance) {
      genuinePaths++; relabelledPaths++;
      if (conics.find(x) < 0) conics.add(x);
      return;
    }
    otherPaths++;
  });
  return {
    slug: definition.slug, instance: instanceId, seed, bezoutBound: report.bezoutBound, paths: report.ends.length,
    genuine: conics.size, genuinePaths, relabelledPaths, doubleLinePaths, otherPaths, failedPaths: report.stats.failed,
    stepsMedian: report.stats.stepsMedian, seconds: report.seconds, rankOneTolerance,
  };
}
