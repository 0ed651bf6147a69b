import fiveConics from '../problems/conics/conics-tangent-to-5-conics.ts';
import { naiveRun } from './naive-run.ts';
import type { BenchCase } from './bench-case.ts';

/**
 * The naive total-degree run on the five-conic problem's sextic formulation at its generic instance (7776 paths, two
 * workers): found = genuine conics, expected 3264 (Chasles 1864); the 4512 other paths should end on the surface of
 * double lines. Target: 3264 found, 0 failed, ≤ 30 s on two cores. Details (paths on double lines, other, failed) go to stderr.
 */
export const naiveFiveConicsCase: BenchCase = {
  name: 'five conics: naive total-degree homotopy on the sextic formulation, 7776 paths, 2 workers (found = genuine conics)',
  expected: 3264,
  async run() {
    const s = await naiveRun(fiveConics, 'generic', 1, 2);
    process.stderr.write(`naive run: ${s.genuine} genuine conics (${s.genuinePaths} paths), ${s.excessPaths} excess (${s.doubleLinePaths} double lines), ${s.atInfinityPaths} at infinity, ${s.singularPaths} singular, ${s.failedPaths} failed, ${s.extendedPaths} re-tracked in double-double, ${s.seconds.toFixed(1)} s\n`);
    return { paths: s.paths, found: s.genuine, failedPaths: s.failedPaths };
  },
};
