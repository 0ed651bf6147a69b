import { solveSystem } from '../../src/engine/index.ts';
import type { BenchCase, BenchOutcome } from './bench-case.ts';
import { naiveFiveConicsCase } from './naive-five-conics-case.ts';
import { naiveQuinticLinesCase } from './naive-quintic-lines-case.ts';
import { stressSystem } from './stress/stress-system.ts';
import { BENCH_SEEDS, CHANGES, DENSE_FAMILIES, EXCESS_FAMILIES, type ChangeRecipe } from './stress/stress-corpus.ts';
import type { StressFamily } from './stress/stress-family.ts';

/**
 * Solves one family after one change of coordinates at every bench seed (total degree, in-process) and sums what the
 * bench reports; one line per seed goes to stderr: found/expected, failed, singular, at infinity, seconds.
 */
async function solveSeeds(family: StressFamily, change: ChangeRecipe): Promise<BenchOutcome> {
  let paths = 0, found = 0, failedPaths = 0;
  const steps: number[] = [];
  for (const seed of BENCH_SEEDS) {
    const s = stressSystem(family, change.make(family.unknowns, seed), seed);
    const r = await solveSystem(s.system, s.parameters, { seed, start: 'total-degree' });
    const st = r.stats;
    const jumps = r.retracks?.recoveredJumps ?? 0, extended = r.retracks?.extendedPaths ?? 0;
    process.stderr.write(`${s.name}: ${r.solutions.length}/${s.expected} found, ${st.failed} failed, ${st.singular} singular, ${st.excess} excess, ${st.atInfinity} at infinity, ${jumps} jumps recovered, ${extended} re-tracked in double-double, ${r.seconds.toFixed(2)} s\n`);
    paths += st.tracked;
    found += r.solutions.length;
    failedPaths += st.failed;
    steps.push(...r.ends.map((e) => e.steps));
  }
  return { paths, found, failedPaths, steps };
}

/**
 * The stress corpus (generators/bench/stress/): every family × change of coordinates over seeds 1…10, expected =
 * 10 × the family's isolated count (Bézout's theorem for the dense families, Cox–Little–O'Shea 2005, ch. 3; the excess
 * families' counts in stress-family.ts), the naive total-degree five-conic run and the naive 15625-path quintic-lines run. Heavy: one run of the whole suite
 * takes several minutes on two cores, so run it with `npm run bench -- --suite stress --runs 1` (run.ts has one
 * --runs for all cases), or pick cases with --only.
 */
export const cases: BenchCase[] = [
  ...[...DENSE_FAMILIES, ...EXCESS_FAMILIES].flatMap((family) => CHANGES.map((change) => ({
    name: `stress: ${family.label} · ${change.label} (total degree, ${family.degrees.reduce((p, d) => p * d, 1)} paths × ${BENCH_SEEDS.length} seeds)`,
    expected: family.expected * BENCH_SEEDS.length,
    run: () => solveSeeds(family, change),
  }))),
  naiveFiveConicsCase,
  naiveQuinticLinesCase,
];
