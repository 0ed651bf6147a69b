import type { ProblemDefinition } from '../../src/atlas/definition.ts';
import { systemOf } from '../../src/atlas/system-of.ts';
import { parametersOf } from '../../src/atlas/parameters-of.ts';
import { ENGINE_VERSION, solveSystem, type PathEnd } from '../../src/engine/index.ts';
import type { NaiveRunFigures } from '../problems/conics/naive-run-figures.ts';

/** The figures of one naive run plus what is measured but not shown: the median steps per path and the seconds. */
export interface NaiveRunSummary extends NaiveRunFigures {
  readonly stepsMedian: number;
  readonly seconds: number;
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
 * workers, and summarises where the paths ended, as the engine judged them; excess ends are also checked to be
 * double lines (rank-one conic matrix, the excess component).
 */
export async function naiveRun(definition: ProblemDefinition, instanceId: string, seed: number, workers: number, rankOneTolerance = 1e-4): Promise<NaiveRunSummary> {
  const instance = definition.instances.find((i) => i.id === instanceId);
  if (!instance) throw new Error(`problem "${definition.slug}": no instance "${instanceId}"`);
  const system = systemOf(definition), parameters = parametersOf(definition, instance);
  const report = await solveSystem(system, parameters, { seed, start: 'total-degree', workers });
  const excess = report.ends.filter((e: PathEnd) => e.outcome === 'excess');
  return {
    slug: definition.slug, instance: instanceId, seed, engineVersion: ENGINE_VERSION, paths: report.ends.length,
    genuine: report.solutions.length, genuinePaths: report.stats.regular,
    excessPaths: excess.length, doubleLinePaths: excess.filter((e) => rankOneDefect(e.point) <= rankOneTolerance).length,
    singularPaths: report.stats.singular, atInfinityPaths: report.stats.atInfinity, failedPaths: report.stats.failed,
    extendedPaths: report.retracks?.extendedPaths ?? 0, recoveredJumps: report.retracks?.recoveredJumps ?? 0,
    rankOneTolerance, stepsMedian: report.stats.stepsMedian, seconds: report.seconds,
  };
}
