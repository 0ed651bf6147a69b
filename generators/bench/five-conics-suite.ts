import { systemOf } from '../../src/atlas/system-of.ts';
import { parametersOf } from '../../src/atlas/parameters-of.ts';
import { createRandom } from '../../src/engine/random.ts';
import { sharedPool } from '../../src/engine/pool/shared-pool.ts';
import { createPoolLegTracker } from '../../src/engine/parameter/pool-tracker.ts';
import { randomParameterPoint } from '../../src/engine/parameter/route.ts';
import { solveByParameterHomotopy, type ParameterProblem, type ParameterSolveReport } from '../../src/engine/parameter/solve-by-parameter-homotopy.ts';
import { buildStartSet } from '../problems/conics/start-set.ts';
import { naiveRun } from '../problems/conics/naive-run.ts';
import fiveConics from '../problems/conics/conics-tangent-to-5-conics.ts';

/** A benchmark case as the bench runner expects it (found = distinct nonsingular solutions; `runs` overrides the runner's repeat count). */
export interface FiveConicsBenchCase {
  readonly name: string;
  readonly expected: number;
  readonly runs?: number;
  run(): Promise<{ paths: number; found: number; failedPaths: number; steps?: number[]; real?: number; retries?: number }>;
}

const WORKERS = 2;
let prepared: Promise<ParameterProblem> | null = null;
function problem(): Promise<ParameterProblem> {
  const solver = fiveConics.solver;
  if (solver?.kind !== 'parameter-homotopy') throw new Error('conics-tangent-to-5-conics must be solved by parameter homotopy');
  return (prepared ??= solver.prepare(systemOf(fiveConics)));
}

async function solveAt(target: Float64Array, seed: number): Promise<ParameterSolveReport> {
  const p = await problem();
  const track = createPoolLegTracker(await sharedPool(WORKERS), p.working);
  return solveByParameterHomotopy(p, target, { seed, track });
}

const summary = (r: ParameterSolveReport) => ({
  paths: r.stats.tracked,
  found: r.solutions.filter((s) => s.condition < 1e10).length,
  failedPaths: r.stats.failed,
  steps: r.ends.map((e) => e.steps),
  real: r.solutions.filter((s) => s.real).length,
  retries: r.stats.retries + r.jumpRetracks,
});

let instance = 0;

/**
 * The five-conic benchmarks (3264 conics tangent to five general conics: Chasles 1864): parameter homotopy from the
 * committed generic set to fresh random complex instances, monodromy discovery from a solution-first seed, the real
 * stage-lights demo (five ellipses), 20 random instances in one case, and the naive 7776-path total-degree run on
 * the sextic formulation. All on a warm pool of two workers.
 */
export const fiveConicsSuite: FiveConicsBenchCase[] = [
  {
    name: 'five conics: parameter homotopy, stored set → random complex instance (2 workers)',
    expected: 3264,
    async run() {
      const k = instance++;
      return summary(await solveAt(randomParameterPoint(30, createRandom(9000 + k)), k));
    },
  },
  {
    name: 'five conics: monodromy discovery from a solution-first seed (2 workers)',
    expected: 3264,
    async run() {
      const k = instance++;
      const pool = await sharedPool(WORKERS);
      const url = (await problem()).working.url;
      const { monodromy } = await buildStartSet({ points: 0, conics: 5 }, 7000 + k, 3264, (chart) => createPoolLegTracker(pool, { url, constants: { points: 0, conics: 5, chart } }));
      return { paths: monodromy.stats.paths, found: monodromy.solutions.length, failedPaths: monodromy.stats.failedPaths, steps: monodromy.stats.steps, retries: 2 * monodromy.stats.jumps };
    },
  },
  {
    name: 'five conics: stage-lights demo, five real ellipses (2 workers; real = real conics)',
    expected: 3264,
    async run() {
      const demo = fiveConics.instances.find((i) => i.kind === 'demo')!;
      return summary(await solveAt(parametersOf(fiveConics, demo), 1));
    },
  },
  {
    name: 'five conics: 20 random complex instances in a row (found = fewest, failed = total)',
    expected: 3264,
    runs: 1,
    async run() {
      let found = Infinity, failedPaths = 0, paths = 0, retries = 0;
      const steps: number[] = [];
      for (let k = 0; k < 20; k++) {
        const s = summary(await solveAt(randomParameterPoint(30, createRandom(5000 + k)), k));
        found = Math.min(found, s.found); failedPaths += s.failedPaths; paths += s.paths; retries += s.retries;
        steps.push(...s.steps);
      }
      return { paths, found, failedPaths, steps, retries };
    },
  },
  {
    name: 'five conics: naive total-degree homotopy on the sextic formulation, 7776 paths (found = genuine conics)',
    expected: 3264,
    runs: 1,
    async run() {
      const s = await naiveRun(fiveConics, 'generic', 1, WORKERS);
      return { paths: s.paths, found: s.genuine, failedPaths: s.failedPaths };
    },
  },
];
