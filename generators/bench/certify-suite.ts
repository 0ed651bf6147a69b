import { readCommittedTangencySet } from '../problems/conics/tangency-store.ts';
import { tangencySystem } from '../problems/conics/tangency-system.ts';
import { certifySolutionsParallel, prepareCertifier } from '../../src/engine/index.ts';
import type { BenchCase } from './bench-case.ts';
import { quadricsWithKnownSolutions } from './known-solution-quadrics.ts';

const loaded = new Map<number, ReturnType<typeof readCommittedTangencySet>>();
/** A committed generic solution set of the conic ladder (read once: reading refines each solution by Newton's method). */
function startSet(points: number): ReturnType<typeof readCommittedTangencySet> {
  let set = loaded.get(points);
  if (set === undefined) { set = readCommittedTangencySet(points); loaded.set(points, set); }
  return set;
}

/**
 * Certification cases (paths = points certified, found = certified distinct, failedPaths = points not certified).
 * The conic cases certify committed generic solution sets (random complex data; tangency-point formulation, 16 or 14
 * unknowns) on two worker threads; workers stay warm between runs, as in a long solve session. The quadric cases use
 * systems of our own with solutions placed first.
 */
export const cases: BenchCase[] = [
  // Chasles (1864): 3264 conics tangent to five conics; 816 through a point and tangent to four (Bashelor–Ksir–Traves 2008)
  ...([[0, 3264], [1, 816]] as const).map(([points, count]) => ({
    name: `certify: ${count} conics ${points === 0 ? '' : 'through 1 point '}tangent to ${5 - points} conics (${16 - 2 * points} unknowns, 2 workers)`,
    expected: count,
    async run() {
      const set = startSet(points);
      const system = tangencySystem(set.shape, set.chart);
      const report = await certifySolutionsParallel(system, set.parameters, set.solutions, { workers: 2 });
      return { paths: set.solutions.length, found: report.certifiedDistinct, failedPaths: set.solutions.length - report.certified };
    },
  })),
  ...[8, 16].map((n) => ({
    name: `certify: random dense quadrics, ${n} unknowns, ${4 * n} placed solutions (1 thread)`,
    expected: 4 * n,
    async run() {
      const { system, parameters, solutions } = quadricsWithKnownSolutions(n, 4 * n, 20261201 + n);
      const report = prepareCertifier(system).certify(parameters, solutions);
      return { paths: solutions.length, found: report.certifiedDistinct, failedPaths: solutions.length - report.certified };
    },
  })),
];
