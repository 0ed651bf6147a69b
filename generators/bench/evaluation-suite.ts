import { type CompiledEquations, compileSystem, compileValuesInDoubleDouble, createRandom, type DoubleDoubleValues } from '../../src/engine/index.ts';
import { tangencySystem } from '../problems/conics/tangency-system.ts';
import { randomChart, tangencySeed } from '../problems/conics/tangency-seed.ts';
import type { BenchCase } from './bench-case.ts';
import { randomSystem } from './engine-systems.ts';

/** A compiled system, its double-double values evaluator, a point and buffers (built once, outside the timing). */
interface Prepared {
  readonly compiled: CompiledEquations;
  readonly dd: DoubleDoubleValues;
  readonly x: Float64Array;
  readonly xlo: Float64Array;
  readonly p: Float64Array;
  readonly v: Float64Array;
  readonly vlo: Float64Array;
  readonly jx: Float64Array;
  readonly jp: Float64Array;
  readonly reference: Float64Array;
}

function prepare(build: () => { compiled: CompiledEquations; x: Float64Array; p: Float64Array }): () => Prepared {
  let prepared: Prepared | undefined;
  return () => {
    if (prepared) return prepared;
    const { compiled, x, p } = build();
    const { neq, n, np } = compiled;
    const reference = new Float64Array(2 * neq);
    compiled.evaluate(x, p, reference, null, null);
    prepared = {
      compiled, dd: compileValuesInDoubleDouble(compiled.program!), x, xlo: new Float64Array(2 * n), p,
      v: new Float64Array(2 * neq), vlo: new Float64Array(2 * neq), jx: new Float64Array(2 * neq * n), jp: new Float64Array(2 * neq * np), reference,
    };
    return prepared;
  };
}

const systems: [string, () => Prepared][] = [
  ['3 dense sextics in 3 unknowns (84 monomials each, random complex coefficients)', prepare(() => {
    const compiled = compileSystem(randomSystem(createRandom(3), 3, 6));
    const x = new Float64Array(6);
    const random = createRandom(4);
    for (let j = 0; j < 3; j++) random.unitComplex(x, 2 * j);
    return { compiled, x, p: new Float64Array(0) };
  })],
  ['conics tangent to 5 conics, tangency-point formulation (16 unknowns, 25 parameters)', prepare(() => {
    const shape = { points: 0, conics: 5 };
    const chart = randomChart(shape, createRandom(5));
    const seed = tangencySeed(shape, chart, createRandom(6));
    return { compiled: compileSystem(tangencySystem(shape, chart)), x: seed.solution, p: seed.parameters };
  })],
];

const EVALUATIONS = 50_000;
type Mode = 'double values + Jacobian' | 'double values' | 'double-double values';

/** Runs the evaluations; found = EVALUATIONS when the last output agrees with the double values (bitwise for double, 1e-10 relative to 1 + |v| for double-double). */
function evaluations(s: Prepared, mode: Mode): number {
  const { compiled, dd, x, xlo, p, v, vlo, jx, jp, reference } = s;
  if (mode === 'double values + Jacobian') for (let k = 0; k < EVALUATIONS; k++) compiled.evaluate(x, p, v, jx, jp);
  else if (mode === 'double values') for (let k = 0; k < EVALUATIONS; k++) compiled.evaluate(x, p, v, null, null);
  else for (let k = 0; k < EVALUATIONS; k++) dd.evaluate(x, xlo, p, v, vlo);
  const tolerance = mode === 'double-double values' ? 1e-10 : 0;
  return v.every((value, i) => Math.abs(value - reference[i]!) <= tolerance * (1 + Math.abs(reference[i]!))) ? EVALUATIONS : 0;
}

/**
 * Cost of one evaluation (paths = evaluations, found = evaluations whose result checks out): double values with the
 * Jacobian, double values alone, and double-double values alone (dd-values/double-values is the price of the
 * extended-precision residual). Systems are compiled and warmed outside the timing, except the first run's JIT.
 */
export const cases: BenchCase[] = systems.flatMap(([label, get]) => (['double values + Jacobian', 'double values', 'double-double values'] as const).map((mode) => ({
  name: `evaluate ×${EVALUATIONS}, ${mode}: ${label}`,
  expected: EVALUATIONS,
  async run() {
    const found = evaluations(get(), mode);
    return { paths: EVALUATIONS, found, failedPaths: EVALUATIONS - found };
  },
})));
