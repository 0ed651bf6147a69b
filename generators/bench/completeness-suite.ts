import { systemOf } from '../../src/atlas/system-of.ts';
import { compileSystem, createPoolLegTracker, type LoopRecoveryReport, recoverByLoops, runTraceTest, sharedPool, type TraceTestReport } from '../../src/engine/index.ts';
import { readCommittedTangencySet } from '../problems/conics/tangency-store.ts';
import { tangencySystem } from '../problems/conics/tangency-system.ts';
import fiveConics from '../problems/conics/conics-tangent-to-5-conics.ts';
import type { BenchCase, BenchOutcome } from './bench-case.ts';

const WORKERS = 2;
type LadderSet = ReturnType<typeof readCommittedTangencySet>;
const stored = new Map<number, LadderSet>();
/** A committed generic set of the conic ladder (read once). */
function ladder(points: number): LadderSet {
  let set = stored.get(points);
  if (set === undefined) { set = readCommittedTangencySet(points); stored.set(points, set); }
  return set;
}
/** Every tenth-or-so solution removed: `count` indices spread over the set. */
const spread = (size: number, count: number): Set<number> => new Set(Array.from({ length: count }, (_, k) => Math.floor(((k + 0.5) * size) / count)));
/** The six coefficients of the last given conic: the parameters the trace test's line moves (a smaller pencil fibre). */
const lastConic = (m: number): number[] => Array.from({ length: 6 }, (_, k) => m - 6 + k);

function loopOutcome(label: string, r: LoopRecoveryReport, removed: number): BenchOutcome {
  process.stderr.write(`${label}: ${r.verdict}, ${r.recovered.length} of ${removed} removed recovered, ${r.loops} loops, ${r.paths} paths, ${r.failedPaths} failed, ${r.jumps} jump re-tracks (${r.unresolvedJumps} unresolved)\n`);
  return { paths: r.paths, found: r.given + r.recovered.length, failedPaths: r.failedPaths };
}

function traceOutcome(label: string, r: TraceTestReport): BenchOutcome {
  const s = r.atStart;
  const fibre = s ? `${s.solutions} + ${s.hyperplane}` : `${r.pencilFibre} reached`;
  process.stderr.write(`${label}: ${r.verdict}, pencil fibre d + e = ${fibre}, defect ${r.defect?.toExponential(2)}, ${r.nodes} λ-nodes, ${r.edges} edges, ${r.paths} paths, ${r.failedPaths} failed, ${r.recovered.length} recovered\n`);
  return { paths: r.paths, found: r.verdict === 'complete' ? r.given + r.recovered.length : r.given, failedPaths: r.failedPaths };
}

let run = 0;

/**
 * Completeness checks on the conic ladder (Chasles 1864; Bashelor–Ksir–Traves 2008): recovery by monodromy loops and
 * the trace test on the 36-conic rung (compiled tangency-point system, this thread), and recovery by loops on the
 * five-conic problem with its hand-written homotopy module over two workers. The five-conic trace test is not here: with
 * one conic moving its pencil fibre passed 14 813 points in 250 000 paths (736 s) without saturating (engine README).
 */
export const cases: BenchCase[] = [
  {
    name: 'completeness: recovery loops, 36-conic rung, 4 of 36 removed (this thread)',
    expected: 36,
    async run() {
      const set = ladder(3), drop = spread(36, 4), seed = run++;
      const kept = set.solutions.filter((_, i) => !drop.has(i));
      return loopOutcome(`36 rung, seed ${seed}`, await recoverByLoops(compileSystem(tangencySystem(set.shape, set.chart)), set.parameters, kept, { seed }), drop.size);
    },
  },
  {
    name: 'completeness: trace test, 36-conic rung, 3 of 36 removed, one conic moving (this thread)',
    expected: 36,
    async run() {
      const set = ladder(3), drop = spread(36, 3), seed = run++;
      const system = tangencySystem(set.shape, set.chart);
      const kept = set.solutions.filter((_, i) => !drop.has(i));
      return traceOutcome(`36 rung, seed ${seed}`, await runTraceTest(system, set.parameters, kept, { seed, moving: lastConic(system.parameters.length) }));
    },
  },
  {
    name: 'completeness: recovery loops, five conics, 12 of 3264 removed (tangency module, 2 workers)',
    expected: 3264,
    async run() {
      const set = ladder(0), drop = spread(3264, 12), seed = run++;
      const solver = fiveConics.solver;
      if (solver?.kind !== 'parameter-homotopy') throw new Error('conics-tangent-to-5-conics must be solved by parameter homotopy');
      const working = (await solver.prepare(systemOf(fiveConics))).working;
      const track = createPoolLegTracker(await sharedPool(WORKERS), working);
      const kept = set.solutions.filter((_, i) => !drop.has(i));
      return loopOutcome(`five conics, seed ${seed}`, await recoverByLoops(compileSystem(tangencySystem(set.shape, set.chart)), set.parameters, kept, { seed, track }), drop.size);
    },
  },
];
