import { systemOf } from '../../src/atlas/system-of.ts';
import { parametersOf } from '../../src/atlas/parameters-of.ts';
import { createPoolLegTracker, createRandom, type ParameterProblem, type ParameterSolveReport, randomParameterPoint, sharedPool, solveByParameterHomotopy } from '../../src/engine/index.ts';
import { buildStoredSet } from '../problems/shared/stored-set.ts';
import { tangencyStoreSpec } from '../problems/conics/tangency-store.ts';
import fiveConics from '../problems/conics/conics-tangent-to-5-conics.ts';
import type { BenchCase, BenchOutcome } from './bench-case.ts';


const WORKERS = 2;
let prepared: Promise<ParameterProblem> | null = null;
function problem(): Promise<ParameterProblem> {
  const solver = fiveConics.solver;
  if (solver?.kind !== 'parameter-homotopy') throw new Error('conics-tangent-to-5-conics must be solved by parameter homotopy');
  return (prepared ??= solver.prepare(systemOf(fiveConics)));
}

async function solveAt(target: Float64Array, seed: number): Promise<ParameterSolveReport> {
  const p = await problem();
  const pool = await sharedPool(WORKERS);
  return solveByParameterHomotopy(p, target, { seed, track: createPoolLegTracker(pool, p.working), trackerFor: async (ref) => createPoolLegTracker(pool, ref) });
}

/** The runner's outcome (found = distinct nonsingular conics); retries and real conics go to stderr beside the table. */
function summary(label: string, r: ParameterSolveReport): BenchOutcome {
  const real = r.solutions.filter((s) => s.real).length;
  process.stderr.write(`${label}: ${r.solutions.length} distinct, ${real} real, ${r.stats.failed} failed, ${r.stats.retries} retries (${r.jumpRetracks} jump re-tracks, ${r.rechartRecovered} recovered in another chart), ${r.seconds.toFixed(2)} s\n`);
  return { paths: r.stats.tracked, found: r.solutions.filter((s) => s.condition < 1e10).length, failedPaths: r.stats.failed, steps: r.ends.map((e) => e.steps) };
}

let instance = 0;

/**
 * The five-conic benchmarks (3264 conics tangent to five general conics: Chasles 1864): parameter homotopy from the
 * committed generic set to fresh random complex instances, monodromy discovery from a solution-first seed, the real
 * stage-lights demo (five ellipses) and 20 random instances in one case. A warm pool of two workers. The naive
 * 7776-path total-degree run is a case of the stress suite (naive-five-conics-case.ts).
 */
export const cases: BenchCase[] = [
  {
    name: 'five conics: parameter homotopy, stored set → random complex instance (2 workers)',
    expected: 3264,
    async run() {
      const k = instance++;
      return summary(`random instance ${k}`, await solveAt(randomParameterPoint(30, createRandom(9000 + k)), k));
    },
  },
  {
    name: 'five conics: monodromy discovery from a solution-first seed (2 workers)',
    expected: 3264,
    async run() {
      const k = instance++;
      const pool = await sharedPool(WORKERS);
      const spec = tangencyStoreSpec({ points: 0, conics: 5 }, 7000 + k, 3264);
      const { monodromy } = await buildStoredSet(spec, (chart) => createPoolLegTracker(pool, { url: spec.homotopy.url, constants: spec.homotopy.constants(chart) }));
      const m = monodromy.stats;
      process.stderr.write(`monodromy: ${monodromy.solutions.length} (${monodromy.stop}), ${m.paths} paths, ${m.failedPaths} failed, ${m.jumps} jumps (${m.unresolvedJumps} unresolved), ${m.nodes} nodes, ${m.edges} edges, ${m.rounds} rounds\n`);
      return { paths: m.paths, found: monodromy.solutions.length, failedPaths: m.failedPaths, steps: m.steps };
    },
  },
  {
    name: 'five conics: stage-lights demo, five real ellipses (2 workers; real = real conics)',
    expected: 3264,
    async run() {
      const demo = fiveConics.instances.find((i) => i.kind === 'demo')!;
      return summary('stage-lights demo', await solveAt(parametersOf(fiveConics, demo), 1));
    },
  },
  {
    name: 'five conics: the same 20 random complex instances each run (found = fewest, failed = total)',
    expected: 3264,
    async run() {
      let found = Infinity, failedPaths = 0, paths = 0;
      const steps: number[] = [];
      for (let k = 0; k < 20; k++) {
        const s = summary(`instance ${5000 + k}`, await solveAt(randomParameterPoint(30, createRandom(5000 + k)), k));
        found = Math.min(found, s.found); failedPaths += s.failedPaths; paths += s.paths;
        steps.push(...(s.steps ?? []));
      }
      return { paths, found, failedPaths, steps };
    },
  },
];
