import { join } from 'node:path';
import type { ProblemDefinition } from '../../../src/atlas/definition.ts';
import { systemOf } from '../../../src/atlas/system-of.ts';
import { COMPILED_LEG_MODULE, compileSystem, createCompiledLegHomotopy, type CompiledLegConstants, type RandomSource } from '../../../src/engine/index.ts';
import { nearestFormThroughLine } from '../shared/forms-through-line.ts';
import { chartLinePoints } from '../shared/line-chart.ts';
import { restrictionMatrix } from '../shared/restriction-matrix.ts';
import type { StoredSetSpec } from '../shared/stored-set.ts';
import { CHART_UNKNOWNS, QUINTIC_EXPONENTS, QUINTIC_FRAME, quinticLinesFormulation } from './quintic-lines-formulation.ts';

/** The 2875 lines on a general quintic threefold (Schubert 1879; Katz 1986). */
export const QUINTIC_LINE_COUNT = 2875;

/** Committed stored sets of the surfaces family live beside the definitions. */
export const SURFACE_SETS_DIR = join(import.meta.dirname, 'data');

let compiled: CompiledLegConstants | undefined;

/** The compiled chart system (once per process; about 0.4 s), as constants of the engine's compiled-leg module. */
function compiledConstants(): CompiledLegConstants {
  if (!compiled) {
    const system = compileSystem(systemOf({ slug: 'lines-on-a-quintic-threefold', formulation: quinticLinesFormulation } as ProblemDefinition));
    compiled = { source: system.source, shape: { neq: system.neq, n: system.n, np: system.np } };
  }
  return compiled;
}

/**
 * Solution-first seed: a random complex line in the chart (six standard complex normals), random complex coefficients,
 * then the nearest quintic containing that line (its six restriction conditions are linear in the 126 coefficients).
 */
export function quinticLineSeed(random: RandomSource): { readonly chart: Float64Array; readonly parameters: Float64Array; readonly solution: Float64Array } {
  const solution = new Float64Array(2 * CHART_UNKNOWNS.length);
  for (let i = 0; i < CHART_UNKNOWNS.length; i++) random.gaussianComplex(solution, 2 * i);
  const free = new Float64Array(2 * QUINTIC_EXPONENTS.length);
  for (let m = 0; m < QUINTIC_EXPONENTS.length; m++) random.gaussianComplex(free, 2 * m);
  const { p, q } = chartLinePoints(QUINTIC_FRAME, solution);
  const parameters = nearestFormThroughLine(free, restrictionMatrix(QUINTIC_EXPONENTS, p, q), 6);
  return { chart: new Float64Array(0), parameters, solution };
}

/**
 * The stored-set spec of the quintic's lines: the chart system compiled once and tracked by the engine's compiled-leg
 * parameter homotopy, seeds built by quinticLineSeed, 2875 expected (Schubert 1879), no alternate charts (the chart's
 * change of coordinates is part of the formulation).
 */
export const quinticLinesSpec: StoredSetSpec = {
  name: 'lines-on-quintic-threefold',
  shape: { degree: 5, dimension: 4 },
  sizes: { unknowns: CHART_UNKNOWNS.length, parameters: QUINTIC_EXPONENTS.length, chart: 0 },
  dir: SURFACE_SETS_DIR,
  seed: 1879,
  expected: QUINTIC_LINE_COUNT,
  homotopy: {
    url: COMPILED_LEG_MODULE,
    create: (args) => createCompiledLegHomotopy({ ...compiledConstants(), ...(args as object) } as unknown as Parameters<typeof createCompiledLegHomotopy>[0]),
    constants: () => ({ ...compiledConstants() }),
  },
  seedBuilder: quinticLineSeed,
};
