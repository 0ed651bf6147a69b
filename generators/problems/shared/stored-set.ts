import { existsSync } from 'node:fs';
import { join } from 'node:path';
import type { SolverChoice } from '../../../src/atlas/definition.ts';
import {
  createInProcessLegTracker, createRandom, discoverByMonodromy, isRealPoint,
  type AlternateCharts, type Homotopy, type HomotopyModuleRef, type LegTracker, type MonodromyResult, type ParameterLeg, type ParameterProblem, type RandomSource, type TrackerSettings,
} from '../../../src/engine/index.ts';
import { readStoredSet, storedSetPaths, writeStoredSet, type StoredSet, type StoredSetSizes } from './stored-set-file.ts';

/** Sets rebuilt by monodromy are cached here (gitignored), one file pair per set name. */
export const STORED_SET_CACHE_DIR = join(import.meta.dirname, '../../../.cache/stored-sets');

/**
 * What a family supplies for one member's stored set: its name and shape (the key), the folder of committed sets, its
 * working homotopy (a module of the { ...constants, from, to, gamma } convention, and the same factory in-process for
 * polishing), a solution-first seed builder, the published count, and optionally random charts to re-track failed
 * paths in.
 */
export interface StoredSetSpec {
  readonly name: string;
  readonly shape: Readonly<Record<string, number>>;
  readonly sizes: StoredSetSizes;
  /** Where committed sets live (beside the definitions); read before the cache. */
  readonly dir: string;
  /** Seeds the seed builder and monodromy; alternate chart k is drawn from seed·1000 + k. */
  readonly seed: number;
  /** The published generic count: a stored set must hold exactly this many, and monodromy stops there. */
  readonly expected: number;
  readonly homotopy: {
    readonly url: string;
    readonly create: (args: Record<string, unknown>) => Homotopy;
    /** The module constants for a chart (structured-cloneable). */
    readonly constants: (chart: Float64Array) => Readonly<Record<string, unknown>>;
    readonly settings?: Partial<TrackerSettings>;
  };
  /** A random chart and a start pair for it, built solution-first, from one random source. */
  readonly seedBuilder: (random: RandomSource) => { readonly chart: Float64Array; readonly parameters: Float64Array; readonly solution: Float64Array };
  /** Random charts and the map of a working solution between two charts, for the engine's chart retries. */
  readonly charts?: {
    readonly draw: (random: RandomSource) => Float64Array;
    readonly convert: (x: Float64Array, from: Float64Array, to: Float64Array) => Float64Array;
  };
}

/** How a family shows a working solution: the map to the shown unknowns and the realness test (default isRealPoint). */
export interface StoredSetView {
  readonly toShown: (x: Float64Array) => Float64Array;
  readonly isReal?: (shown: Float64Array) => boolean;
}

const legFactory = (spec: StoredSetSpec, chart: Float64Array) => (leg: ParameterLeg): Homotopy =>
  spec.homotopy.create({ ...spec.homotopy.constants(chart), ...leg });

/** Reads a committed or cached set file of this spec, polished through the spec's own homotopy (see readStoredSet). */
export function readSetOf(spec: StoredSetSpec, file: string): StoredSet {
  return readStoredSet(file, spec, (chart, parameters) => legFactory(spec, chart)({ from: parameters, to: parameters, gamma: [1, 0] }));
}

/** Finds a set by monodromy from the spec's solution-first seed; throws unless it reaches the expected count. */
export async function buildStoredSet(spec: StoredSetSpec, track?: (chart: Float64Array) => LegTracker): Promise<{ set: StoredSet; monodromy: MonodromyResult }> {
  const random = createRandom(spec.seed);
  const { chart, parameters, solution } = spec.seedBuilder(random);
  const legTracker = track ? track(chart) : createInProcessLegTracker(legFactory(spec, chart));
  const monodromy = await discoverByMonodromy({ track: legTracker, seed: { parameters, solution }, random, expected: spec.expected });
  if (monodromy.solutions.length !== spec.expected) {
    throw new Error(`monodromy for ${spec.name} found ${monodromy.solutions.length} solutions, not the published ${spec.expected} (stop: ${monodromy.stop})`);
  }
  return { set: { name: spec.name, shape: spec.shape, seed: spec.seed, chart, parameters: monodromy.parameters, solutions: monodromy.solutions }, monodromy };
}

/** The committed set if present, else the cached one, else a new one built by monodromy and cached; the count is checked. */
export async function loadStoredSet(spec: StoredSetSpec, track?: (chart: Float64Array) => LegTracker, cacheDir = STORED_SET_CACHE_DIR): Promise<StoredSet> {
  for (const dir of [spec.dir, cacheDir]) {
    const file = storedSetPaths(dir, spec.name).header;
    if (existsSync(file)) {
      const set = readSetOf(spec, file);
      if (set.solutions.length !== spec.expected) throw new Error(`${file}: holds ${set.solutions.length} solutions, expected ${spec.expected}`);
      return set;
    }
  }
  const { set } = await buildStoredSet(spec, track);
  writeStoredSet(set, cacheDir);
  return set;
}

/** The committed files a definition solved from this spec reads at run time (for its definition hash `reads`). */
export function storedSetReads(spec: StoredSetSpec): string[] {
  const paths = storedSetPaths(spec.dir, spec.name);
  return [paths.header, paths.solutions];
}

/** The alternate charts of a spec for the engine's chart retries (chart k from seed·1000 + k), or undefined without charts. */
export function alternateChartsOf(spec: StoredSetSpec): AlternateCharts | undefined {
  const charts = spec.charts;
  if (!charts) return undefined;
  return {
    constants: (k) => spec.homotopy.constants(charts.draw(createRandom(spec.seed * 1000 + k))),
    convert: (x, from, to) => charts.convert(x, from.chart as Float64Array, to.chart as Float64Array),
  };
}

/** The engine's ParameterProblem for the shown system from a loaded set. */
export function parameterProblemOf(spec: StoredSetSpec, set: StoredSet, shown: ParameterProblem['shown'], view: StoredSetView): ParameterProblem {
  const working: HomotopyModuleRef = { url: spec.homotopy.url, constants: spec.homotopy.constants(set.chart), ...(spec.homotopy.settings ? { settings: spec.homotopy.settings } : {}) };
  const alternateCharts = alternateChartsOf(spec);
  return {
    shown,
    working,
    start: { parameters: set.parameters, solutions: set.solutions },
    toShown: view.toShown,
    isReal: view.isReal ?? isRealPoint,
    ...(alternateCharts ? { alternateCharts } : {}),
  };
}

/** A definition's solver: parameter homotopy from the spec's stored set (loaded, or rebuilt and cached, on first use). */
export function storedSetSolver(spec: StoredSetSpec, view: StoredSetView): SolverChoice {
  return {
    kind: 'parameter-homotopy',
    expected: spec.expected,
    prepare: async (shown) => parameterProblemOf(spec, await loadStoredSet(spec), shown, view),
  };
}
