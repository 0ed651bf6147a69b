import { join } from 'node:path';
import { readSetOf, type StoredSetSpec } from '../shared/stored-set.ts';
import { storedSetPaths, type StoredSet } from '../shared/stored-set-file.ts';
import { createHomotopy } from './tangency-homotopy.ts';
import { convertChart } from './tangency-rechart.ts';
import { randomChart, tangencySeed } from './tangency-seed.ts';
import { chartCount, parameterCount, unknownCount, type TangencyShape } from './tangency-layout.ts';

/** Conics through p general points tangent to 5 − p general conics, p = 5…0 (Chasles 1864; Bashelor–Ksir–Traves 2008). */
export const CONIC_LADDER: Readonly<Record<number, number>> = { 5: 1, 4: 6, 3: 36, 2: 184, 1: 816, 0: 3264 };

/** Committed stored sets of the conic ladder live beside the definitions. */
export const TANGENCY_SETS_DIR = join(import.meta.dirname, 'data');

/**
 * The stored-set spec of the rung with `shape` in the tangency-point formulation: the compiled-by-hand homotopy of
 * tangency-homotopy.ts (one stricter retry; a path that still fails is re-tracked in another random chart), seeds built
 * solution-first by tangency-seed.ts, and `expected` the published count (Chasles 1864).
 */
export function tangencyStoreSpec(shape: TangencyShape, seed: number, expected: number): StoredSetSpec {
  return {
    name: `start-${shape.points}-points-${shape.conics}-conics`,
    shape: { conics: shape.conics, points: shape.points },
    sizes: { unknowns: unknownCount(shape), parameters: parameterCount(shape), chart: chartCount(shape) },
    dir: TANGENCY_SETS_DIR,
    seed,
    expected,
    homotopy: {
      url: new URL('./tangency-homotopy.ts', import.meta.url).href,
      create: (args) => createHomotopy(args as unknown as Parameters<typeof createHomotopy>[0]),
      constants: (chart) => ({ points: shape.points, conics: shape.conics, chart }),
      settings: { retries: 1, estimateCorrectorError: true },
    },
    seedBuilder: (random) => {
      const chart = randomChart(shape, random);
      return { chart, ...tangencySeed(shape, chart, random) };
    },
    charts: {
      draw: (random) => randomChart(shape, random),
      convert: (x, from, to) => convertChart(shape, x, from, to),
    },
  };
}

/** The committed set of the rung with p points (built from seed 3264 + p, as its header records), read and polished. */
export function readCommittedTangencySet(points: number): StoredSet & { readonly shape: TangencyShape } {
  const spec = tangencyStoreSpec({ points, conics: 5 - points }, 3264 + points, CONIC_LADDER[points]!);
  const set = readSetOf(spec, storedSetPaths(spec.dir, spec.name).header);
  return { ...set, shape: { points, conics: 5 - points } };
}
