import type { InstanceDefinition, ProblemDefinition } from '../../src/atlas/definition.ts';
import type { Completeness, InstanceResult, PathStats, Solution } from '../../src/atlas/record.ts';
import type { PolynomialSystem } from '../../src/engine/index.ts';
import { coordinatesOf, isRealValues } from './coordinates-of.ts';
import type { EngineReport, EngineServices } from './engine-services.ts';
import { figureOf } from './figure-of.ts';
import { wantsGroup } from './monodromy-group-of.ts';
import { pathNotes } from './path-notes.ts';
import { roundNumbers } from './round-numbers.ts';
import { instanceSidecar, type InstanceSidecar } from './sidecars-of.ts';

/** The inputs of one instance's record entry: what was solved, with which seed and strategy, and the engine's report. */
export interface InstanceRun {
  readonly definition: ProblemDefinition;
  readonly system: PolynomialSystem;
  readonly instance: InstanceDefinition;
  readonly seed: number;
  readonly method: string;
  readonly parameters: Float64Array;
  readonly report: EngineReport;
  readonly where: string;
  /** Worker threads the certifier may use (the solve's --workers); omitted: one thread. Same verdict either way. */
  readonly workers?: number;
}

/**
 * Certifies the engine's solutions and assembles the instance's record entry, rounded to the record's fixed digits:
 * values in the definition's coordinates (multiplicity 1: they are nonsingular), realness judged on them (|im| ≤ 1e-8·(1+|re|)), certification per
 * solution, the count ladder (complete only for a generic instance whose certified distinct count equals the
 * published count), path statistics, notes and the figure. Returns the seconds spent solving and certifying too, and
 * the instance's sidecar (expanded equations with the exact parameters, certificate boxes) for the files beside the record.
 * A generic instance with 2…LARGE_GROUP_LIMIT solutions (wantsGroup), all certified distinct, also gets its monodromy group (engine.group).
 */
export async function assembleInstance(run: InstanceRun, engine: EngineServices): Promise<{ result: InstanceResult; seconds: number; sidecar: InstanceSidecar }> {
  const { definition, instance, report, where } = run;
  const realParameters = run.parameters.every((v, k) => k % 2 === 0 || v === 0);
  const checks = engine.complete ? await engine.complete(run.system, run.parameters, report.solutions.map((s) => s.point), { seed: run.seed, workers: run.workers }) : null;
  // solutions the completeness checks recovered follow the solve's own, in the order they were found
  const found = [...report.solutions, ...(checks?.recovered ?? [])];
  const points = found.map((s) => s.point);
  const verdict = await engine.certify(run.system, run.parameters, points, run.workers === undefined ? { realParameters } : { realParameters, workers: run.workers });
  const names = definition.formulation.parameters;
  const parameters = Object.fromEntries(names.map((n, j) => [n, [run.parameters[2 * j]!, run.parameters[2 * j + 1]!] as [number, number]]));
  const solutions: Solution[] = found.map((s, i) => {
    const values = coordinatesOf(definition, s.point, where);
    const v = verdict.solutions[i] ?? { certified: false, certifiedReal: false };
    return {
      values: pairs(values),
      residual: s.residual,
      condition: Number.isFinite(s.condition) && s.condition > 0 ? s.condition : null,
      multiplicity: 1,
      real: isRealValues(values),
      certified: v.certified,
      certifiedReal: v.certifiedReal,
    };
  });
  const rounded = roundNumbers(solutions);
  const group = engine.group && instance.kind === 'generic' && wantsGroup(found.length) && verdict.certifiedDistinct === found.length
    ? await engine.group(run.system, run.parameters, points, run.workers === undefined ? { seed: run.seed, definition } : { seed: run.seed, workers: run.workers, definition })
    : null;
  const trueCount = definition.trueCount.value;
  const counts = {
    bezoutBound: report.bezoutBound,
    multihomogeneousBound: report.multihomogeneousBound ?? null,
    trueCount,
    found: solutions.length,
    certified: verdict.certified,
    certifiedDistinct: verdict.certifiedDistinct,
    real: solutions.filter((s) => s.real).length,
    certifiedReal: verdict.certifiedReal,
    ...completeFlags(instance.kind, trueCount, verdict.certifiedDistinct, solutions.length, checks?.checks.trace.verdict),
  };
  const st = report.stats;
  const paths: PathStats = {
    tracked: st.tracked, nonsingular: st.regular, singular: st.singular, excess: st.excess, atInfinity: st.atInfinity, failed: st.failed,
    failures: { ...st.failures }, stepsMedian: st.stepsMedian, stepsMax: st.stepsMax, retries: st.retries,
    ...(report.retracks ? { retracks: { ...report.retracks } } : {}),
  };
  const roundedParameters = roundNumbers(parameters);
  const realSolutions = rounded.flatMap((s, index) => (s.real ? [{ index, values: s.values.map(([re]) => re) }] : []));
  const result: InstanceResult = {
    id: instance.id,
    kind: instance.kind,
    label: instance.label,
    description: instance.description,
    seed: run.seed,
    method: run.method,
    parameters: roundedParameters,
    counts,
    paths: roundNumbers(paths),
    solutions: rounded,
    figure: roundNumbers(figureOf(definition, roundedParameters, realSolutions, where)),
    notes: [...pathNotes(counts, paths, instance.kind), ...sharedEnds(report), ...recoveredNotes(checks?.checks)],
    ...(checks ? { completeness: roundNumbers(checks.checks) } : {}),
    ...(group ? { monodromyGroup: group } : {}),
  };
  return { result, seconds: report.seconds + verdict.seconds + (checks?.seconds ?? 0), sidecar: instanceSidecar(instance.id, run.system, run.parameters, verdict) };
}

/**
 * Whether the generic instance is complete, and by what: the published count (certified distinct equals it) or,
 * without one, the trace test (its verdict 'complete' and every found solution certified distinct).
 */
export function completeFlags(kind: 'generic' | 'demo', trueCount: number | null, certifiedDistinct: number, found: number, trace: string | undefined): { complete: boolean; completeBy: 'published count' | 'trace test' | null } {
  if (kind !== 'generic') return { complete: false, completeBy: null };
  if (trueCount !== null) return certifiedDistinct === trueCount ? { complete: true, completeBy: 'published count' } : { complete: false, completeBy: null };
  return trace === 'complete' && found > 0 && certifiedDistinct === found ? { complete: true, completeBy: 'trace test' } : { complete: false, completeBy: null };
}

/** Notes on solutions the completeness checks found after the solve. */
function recoveredNotes(checks: Completeness | undefined): string[] {
  if (!checks) return [];
  const notes: string[] = [];
  if (checks.recovery.recovered > 0) notes.push(`${checks.recovery.recovered} solution${checks.recovery.recovered === 1 ? '' : 's'} recovered by monodromy loops after the solve`);
  if (checks.trace.recovered > 0) notes.push(`${checks.trace.recovered} solution${checks.trace.recovered === 1 ? '' : 's'} recovered by the trace test's completed fibre`);
  return notes;
}

/** A note when distinct nonsingular solutions were reached by more than one path (a sign of path jumping). */
function sharedEnds(report: EngineReport): string[] {
  const shared = report.solutions.filter((s) => s.paths.length > 1).length;
  return shared > 0 ? [`${shared} nonsingular solution${shared === 1 ? ' was' : 's were'} reached by more than one path (paths may have jumped)`] : [];
}

function pairs(packed: Float64Array): [number, number][] {
  const out: [number, number][] = [];
  for (let k = 0; k < packed.length; k += 2) out.push([packed[k]!, packed[k + 1]!]);
  return out;
}
