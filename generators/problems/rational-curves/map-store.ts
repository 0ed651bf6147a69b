import { join } from 'node:path';
import { compileSystem, compileValuesInDoubleDouble, type TrackerSettings } from '../../../src/engine/index.ts';
import type { StoredSetSpec } from '../shared/stored-set.ts';
import { CHARTED_MAP_LEG_MODULE, createHomotopy, type ChartedMapLegConstants } from './charted-map-leg-module.ts';
import { chartedMapSystem, chartedMapUnknowns, chartLength, convertMapChart, randomMapChart, shownToCharted } from './charted-map.ts';
import { mapParameters, parametrisedMapSeed } from './parametrised-map.ts';

/** Committed stored sets of the rational-curve family live beside the definitions. */
export const MAP_SETS_DIR = join(import.meta.dirname, 'data');

/**
 * Tracker settings of the maps: corrections in double-double, and ends counted singular only above condition 1e15 (not
 * 1e10): near a degenerate map (preimages crowding together) genuine solutions reach conditions of 1e10 and beyond in
 * binary64, which the extended-precision Newton still resolves (measured at degree 4 with t affine: with 1e13 monodromy
 * stalled at 619 of 620 twice, with 1e15 it reached 620). Two stricter retries, then other random charts.
 */
export const MAP_TRACKER_SETTINGS: Partial<TrackerSettings> = { precision: 'double-double', singularCondition: 1e15, retries: 2 };

/** The compiled working system of a chart with its double-double evaluator, as module constants (the last chart is memoised). */
function compiledConstants(degree: number): (chart: Float64Array) => ChartedMapLegConstants {
  let last: { key: string; value: ChartedMapLegConstants } | undefined;
  return (chart) => {
    const key = Array.from(chart).join(',');
    if (last?.key !== key) {
      const compiled = compileSystem(chartedMapSystem(degree, chart));
      last = { key, value: { source: compiled.source, shape: { neq: compiled.neq, n: compiled.n, np: compiled.np }, extendedSource: compileValuesInDoubleDouble(compiled.program!).source } };
    }
    return last.value;
  };
}

/**
 * The stored-set spec of rational plane curves of degree d through 3d − 1 points as parametrised maps in a random chart
 * (charted-map.ts): the charted-map leg module with MAP_TRACKER_SETTINGS, seeds built solution-first (a random map, then the points on it), `expected` the published count.
 */
export function mapStoreSpec(degree: number, seed: number, expected: number): StoredSetSpec {
  const constants = compiledConstants(degree);
  return {
    name: `rational-maps-degree-${degree}`,
    shape: { degree },
    sizes: { unknowns: chartedMapUnknowns(degree).length, parameters: mapParameters(degree).length, chart: chartLength(degree) },
    dir: MAP_SETS_DIR,
    seed,
    expected,
    homotopy: {
      url: CHARTED_MAP_LEG_MODULE,
      create: (args) => createHomotopy(args as unknown as Parameters<typeof createHomotopy>[0]),
      constants: (chart) => ({ ...constants(chart), chart }),
      settings: MAP_TRACKER_SETTINGS,
    },
    seedBuilder: (random) => {
      const chart = randomMapChart(degree, random);
      const { parameters, solution } = parametrisedMapSeed(degree, random);
      return { chart, parameters, solution: shownToCharted(degree, solution, chart) };
    },
    charts: {
      draw: (random) => randomMapChart(degree, random),
      convert: (x, from, to) => convertMapChart(degree, x, from, to),
    },
  };
}

/** The recorded seeds of the committed sets, by degree (chart, seed point and monodromy are drawn from them). */
export const MAP_SET_SEEDS: Readonly<Record<number, number>> = { 4: 4620 };
