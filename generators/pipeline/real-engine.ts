import type { EngineServices, SolveStrategy } from './engine-services.ts';
import { AtlasError } from './atlas-error.ts';

/**
 * The production engine: strategies keyed by SolverChoice kind, wired to src/engine's solveSystem (start systems
 * 'total-degree' and 'multihomogeneous'), solveByParameterHomotopy, certification and collectSolutions. With
 * `workers`, paths (chart re-tracks too) run on the shared tracking pool and certification on the certification
 * workers, with the same record as one thread; close() ends both. Modules load on first use, so commands that solve
 * nothing (refresh with nothing stale, check) stay fast.
 * To add a strategy (monodromy, say), add one entry to `strategies` below.
 */
export async function loadEngine(): Promise<EngineServices> {
  const engineSurface = await import('../../src/engine/index.ts');
  const { solveSystem, finishSolve, certifySolutions, certifySolutionsParallel, closeCertifyWorkers, ENGINE_VERSION, solveByParameterHomotopy, createPoolLegTracker, createModuleLegTracker, sharedPool, closeSharedPool } = engineSurface;
  const startSystem = (start: 'total-degree' | 'multihomogeneous', label: string): SolveStrategy => ({
    label,
    shardable: true,
    solve: (system, parameters, o) =>
      solveSystem(system, parameters, { seed: o.seed, start, workers: o.workers, shard: o.shard, onProgress: o.onProgress && ((done, total) => o.onProgress!({ done, total })) }),
  });
  const strategies: Record<string, SolveStrategy> = {
    'total-degree': startSystem('total-degree', 'total-degree homotopy'),
    multihomogeneous: startSystem('multihomogeneous', 'multihomogeneous homotopy'),
    'parameter-homotopy': {
      label: 'parameter homotopy from a stored generic solution set',
      shardable: false,
      solve: async (system, parameters, o, definition) => {
        const choice = definition.solver;
        if (choice?.kind !== 'parameter-homotopy') throw new AtlasError('input', `solver.kind: expected "parameter-homotopy"`);
        const problem = await choice.prepare(system);
        if (!o.workers) return solveByParameterHomotopy(problem, parameters, { seed: o.seed });
        const pool = await sharedPool(o.workers);
        return solveByParameterHomotopy(problem, parameters, {
          seed: o.seed,
          track: createPoolLegTracker(pool, problem.working),
          trackerFor: async (ref) => createPoolLegTracker(pool, ref),
        });
      },
    },
  };
  const { completenessChecks } = await import('./completeness-checks.ts');
  const { monodromyGroupOf } = await import('./monodromy-group-of.ts');
  return {
    version: ENGINE_VERSION,
    strategies,
    complete: (system, parameters, points, { seed }) => completenessChecks(engineSurface, system, parameters, points, seed),
    // Problems solved from a stored set walk their loops there, with the family's own homotopy module (its random
    // charts keep routes the shown formulation's fixed chart can lose); the group is the same at every base point.
    group: async (system, parameters, points, { seed, workers, definition }) => {
      const choice = definition?.solver;
      if (choice?.kind !== 'parameter-homotopy') return monodromyGroupOf(engineSurface, system, parameters, points, seed, workers === undefined ? {} : { workers });
      const problem = await choice.prepare(system);
      const start = problem.start;
      if (start.solutions.length !== points.length) return monodromyGroupOf(engineSurface, system, parameters, points, seed, workers === undefined ? {} : { workers });
      const track = workers ? createPoolLegTracker(await sharedPool(workers), problem.working) : await createModuleLegTracker(problem.working);
      const shape = { n: start.solutions[0]!.length / 2, np: start.parameters.length / 2 };
      return monodromyGroupOf(engineSurface, system, parameters, points, seed, { base: { shape, parameters: start.parameters, solutions: start.solutions, track } });
    },
    certify: (system, parameters, points, { workers, ...options }) =>
      workers ? certifySolutionsParallel(system, parameters, points, { ...options, workers }) : certifySolutions(system, parameters, points, options),
    collect: (system, parameters, ends, bounds, seed) => finishSolve(system, parameters, ends, { ...bounds }, seed),
    close: async () => { await Promise.all([closeSharedPool(), closeCertifyWorkers()]); },
  };
}
