import type { InstanceDefinition } from '../../src/atlas/definition.ts';
import { parametersOf } from '../../src/atlas/parameters-of.ts';
import type { InstanceResult, SolveRecord } from '../../src/atlas/record.ts';
import { AtlasError } from './atlas-error.ts';
import { assembleInstance } from './assemble-instance.ts';
import { buildRecord } from './build-record.ts';
import type { EngineProgress, EngineReport, EngineServices } from './engine-services.ts';
import { displayPath, type LoadedDefinition } from './load-definition.ts';
import { strategyFor } from './strategy-for.ts';
import { problemSidecars, type InstanceSidecar, type ProblemSidecars } from './sidecars-of.ts';

/** Options of one solve: a seed replacing every instance's seed, worker count, and a progress callback. */
export interface SolveOptions {
  readonly seed?: number;
  readonly workers?: number;
  readonly onProgress?: (instance: InstanceDefinition, progress: EngineProgress) => void;
}

/** A solved problem: its record (no history yet), the seconds each instance took (solve + certify), and its sidecar files. */
export interface SolvedProblem {
  readonly record: SolveRecord;
  readonly seconds: readonly number[];
  readonly sidecars: ProblemSidecars;
}

/** The parameters of an instance with the effective seed, errors naming the definition file and field. */
export function instanceParameters(loaded: LoadedDefinition, instance: InstanceDefinition): Float64Array {
  try {
    return parametersOf(loaded.definition, instance);
  } catch (error) {
    throw new AtlasError('input', `${displayPath(loaded.file)}: ${error instanceof Error ? error.message : String(error)}`);
  }
}

/** Runs a strategy, turning an engine throw into AtlasError('solve') that names the instance. */
export async function runEngine<T>(where: string, run: () => Promise<T>): Promise<T> {
  try {
    return await run();
  } catch (error) {
    if (error instanceof AtlasError) throw error;
    throw new AtlasError('solve', `${where}: the engine failed: ${error instanceof Error ? error.message : String(error)}`);
  }
}

/**
 * Solves every instance of a loaded definition with the strategy its solver.kind names, certifies, and builds the
 * record. Deterministic for a given seed and engine: no timings or dates enter the record.
 */
export async function solveProblem(loaded: LoadedDefinition, engine: EngineServices, options: SolveOptions = {}): Promise<SolvedProblem> {
  const strategy = strategyFor(loaded.definition, engine, displayPath(loaded.file));
  const results: InstanceResult[] = [];
  const seconds: number[] = [];
  const sidecars: InstanceSidecar[] = [];
  for (const original of loaded.definition.instances) {
    const instance = options.seed === undefined ? original : { ...original, seed: options.seed };
    const where = `${displayPath(loaded.file)}: instance "${instance.id}"`;
    const parameters = instanceParameters(loaded, instance);
    const onProgress = options.onProgress && ((p: EngineProgress) => options.onProgress!(instance, p));
    const report: EngineReport = await runEngine(where, () =>
      strategy.solve(loaded.system, parameters, { seed: instance.seed, workers: options.workers, onProgress }, loaded.definition),
    );
    const run = { definition: loaded.definition, system: loaded.system, instance, seed: instance.seed, method: strategy.label, parameters, report, where, workers: options.workers };
    const done = await runEngine(where, () => assembleInstance(run, engine));
    results.push(done.result);
    seconds.push(done.seconds);
    sidecars.push(done.sidecar);
  }
  return { record: buildRecord(loaded, engine.version, results), seconds, sidecars: problemSidecars(loaded.definition.slug, loaded.system, sidecars) };
}
