import type { PolynomialSystem } from '../../src/engine/index.ts';
import type { Completeness } from '../../src/atlas/record.ts';
import type { CompletenessReport } from './engine-services.ts';

/** Found sets larger than this skip monodromy recovery in a solve (measured: 36 solutions take 0.2 s, 228 paths). */
export const RECOVERY_LIMIT = 200;
/** Found sets larger than this skip the trace test (its pencil fibre is several times larger; 28 bitangents already need more than the path budget). */
export const TRACE_LIMIT = 60;
/** Paths the trace test may track before it reports that it could not confirm completeness. */
export const TRACE_PATH_BUDGET = 20000;
/** Quiet loops before recovery stops: small sets need many (a loop often moves none of 4–9 solutions). */
const quietLoops = (found: number): number => (found <= 10 ? 10 : 3);

type Engine = typeof import('../../src/engine/index.ts');

/** Residual (backward error) and condition in natural units, as the solve reports them, for a recovered point. */
function measured(engine: Pick<Engine, 'compileSystem' | 'createAffineTools' | 'naturalUnits'>, system: PolynomialSystem, parameters: Float64Array): (x: Float64Array) => { point: Float64Array; residual: number; condition: number } {
  const tools = engine.createAffineTools(engine.compileSystem(system), parameters, engine.naturalUnits(system, parameters));
  return (x) => ({ point: x, residual: tools.residual(x), condition: tools.condition(x) });
}

/**
 * The completeness checks the pipeline runs after a solve (engine's src/engine/complete): monodromy recovery by loops
 * (Duff et al. 2019) seeded with the found solutions, then the trace test (Leykin–Rodriguez–Sottile 2018) on the
 * found set with the recovered ones. Sets above RECOVERY_LIMIT / TRACE_LIMIT are 'skipped' (said in the record with
 * the limit); a system without parameters gives 'not-applicable'. Deterministic for a seed.
 */
export async function completenessChecks(engine: Pick<Engine, 'compileSystem' | 'recoverByLoops' | 'runTraceTest' | 'createAffineTools' | 'naturalUnits'>, system: PolynomialSystem, parameters: Float64Array, points: readonly Float64Array[], seed: number): Promise<CompletenessReport> {
  const began = performance.now();
  const found = points.length;
  const measure = measured(engine, system, parameters);
  const recovered: { point: Float64Array; residual: number; condition: number }[] = [];
  let recovery: Completeness['recovery'] = { verdict: 'skipped', loops: 0, paths: 0, failedPaths: 0, recovered: 0 };
  if (found > 0 && found <= RECOVERY_LIMIT) {
    const loops = await engine.recoverByLoops(engine.compileSystem(system), parameters, points, { seed, quietLoops: quietLoops(found) });
    recovered.push(...loops.recovered.map((r) => measure(r.point)));
    recovery = { verdict: loops.verdict, loops: loops.loops, paths: loops.paths, failedPaths: loops.failedPaths, recovered: loops.recovered.length };
  }
  let trace: Completeness['trace'] = {
    verdict: 'skipped',
    reason: found === 0 ? 'Nothing was found to test.' : `Not run: ${found + recovered.length} solutions exceed the trace test's limit of ${TRACE_LIMIT} in a solve.`,
    defect: null, fibre: 0, paths: 0, recovered: 0,
  };
  const all = [...points, ...recovered.map((r) => r.point)];
  if (found > 0 && all.length <= TRACE_LIMIT) {
    const t = await engine.runTraceTest(system, parameters, all, { seed, maxPaths: TRACE_PATH_BUDGET });
    recovered.push(...t.recovered.map((r) => measure(r.point)));
    trace = { verdict: t.verdict, reason: t.reason, defect: t.defect, fibre: t.pencilFibre, paths: t.paths, recovered: t.recovered.length };
  }
  return { recovered, checks: { recovery, trace }, seconds: (performance.now() - began) / 1000 };
}
