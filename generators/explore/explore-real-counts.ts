import type { Exploration } from '../../src/atlas/exploration.ts';
import { EXPLORATION_SCHEMA_VERSION } from '../../src/atlas/exploration.ts';
import type { LoadedDefinition } from '../pipeline/load-definition.ts';
import { certifiedRealCount } from './certified-real-count.ts';
import { realMove, realSample } from './real-sample.ts';

type Engine = Pick<typeof import('../../src/engine/index.ts'), 'compileSystem' | 'carrySolutions' | 'prepareCertifier' | 'createRandom'>;

/** Options: samples to draw, climb steps after them, the seed, the generic solutions (in the unknowns) and progress. */
export interface ExploreOptions {
  readonly samples: number;
  readonly climbSteps: number;
  readonly seed: number;
  readonly engineVersion: string;
  /** The generic instance's parameters and its distinct nonsingular solutions there. */
  readonly generic: { readonly parameters: Float64Array; readonly solutions: readonly Float64Array[] };
  readonly onProgress?: (done: number, total: number) => void;
}

/** Stalled climb steps before the move shrinks by half; the first move size and the smallest. */
const STALL = 5, FIRST_SCALE = 0.5, LAST_SCALE = 1 / 256;

/**
 * The real-solution explorer: carries the generic solution set to `samples` random real instances (standard normal
 * parameters, seeded) by parameter homotopy and records the certified real counts; then climbs from the best instance
 * by random real moves (accepted only when the certified real count grows; the move halves after 5 stalled steps, down
 * to 1/256). Incomplete carries are counted apart. Deterministic for a seed.
 */
export async function exploreRealCounts(engine: Engine, loaded: LoadedDefinition, options: ExploreOptions): Promise<Exploration> {
  const { system, definition } = loaded;
  const compiled = engine.compileSystem(system);
  const certifier = engine.prepareCertifier(system);
  const random = engine.createRandom(options.seed);
  const total = options.samples + options.climbSteps;
  const countAt = async (p: Float64Array, k: number): Promise<number | null> => {
    const carried = await engine.carrySolutions(compiled, options.generic.parameters, p, options.generic.solutions, { seed: options.seed + 1 + k });
    return certifiedRealCount(certifier, p, carried);
  };
  const histogram = new Map<number, number>();
  let incomplete = 0;
  let best: { real: number; p: Float64Array; origin: string } | null = null;
  for (let k = 0; k < options.samples; k++) {
    const p = realSample(compiled.np, random);
    const real = await countAt(p, k);
    if (real === null) incomplete++;
    else {
      histogram.set(real, (histogram.get(real) ?? 0) + 1);
      if (best === null || real > best.real) best = { real, p, origin: `sample ${k + 1}` };
    }
    options.onProgress?.(k + 1, total);
  }
  const climb: Exploration['climb'] = [];
  let scale = FIRST_SCALE, stalled = 0;
  for (let step = 1; step <= options.climbSteps && best !== null && best.real < options.generic.solutions.length; step++) {
    const q = realMove(best.p, scale, random);
    const real = await countAt(q, options.samples + step);
    if (real !== null && real > best.real) {
      best = { real, p: q, origin: `climb step ${step}` };
      climb.push({ step, scale, real });
      stalled = 0;
    } else if (++stalled >= STALL) {
      scale = Math.max(scale / 2, LAST_SCALE);
      stalled = 0;
    }
    options.onProgress?.(options.samples + step, total);
  }
  if (best === null) throw new Error(`${definition.slug}: no sample carried the solution set completely (${incomplete} of ${options.samples} incomplete)`);
  const names = definition.formulation.parameters;
  return {
    schemaVersion: EXPLORATION_SCHEMA_VERSION,
    slug: definition.slug,
    engineVersion: options.engineVersion,
    definitionHash: loaded.hash,
    seed: options.seed,
    degree: options.generic.solutions.length,
    samples: options.samples,
    incompleteSamples: incomplete,
    distribution: [...histogram.entries()].sort(([a], [b]) => a - b).map(([real, samples]) => ({ real, samples })),
    climbSteps: options.climbSteps,
    climb,
    best: { real: best.real, origin: best.origin, parameters: Object.fromEntries(names.map((n, j) => [n, best!.p[2 * j]!])) },
    realMaximum: definition.realMaximum ? { ...definition.realMaximum } : null,
  };
}
