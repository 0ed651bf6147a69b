import { join } from 'node:path';
import { COMMITTED_DIR, readStartSet } from '../problems/conics/start-set.ts';
import { tangencySystem } from '../problems/conics/tangency-system.ts';
import { certifySolutionsParallel } from '../../src/engine/certify/certify-parallel.ts';
import { prepareCertifier } from '../../src/engine/certify/certify-solutions.ts';
import type { BenchCase } from './bench-case.ts';
import { quadricsWithKnownSolutions } from './known-solution-quadrics.ts';


const fiveConics = (() => {
  let loaded: ReturnType<typeof readStartSet> | null = null;
  return () => (loaded ??= readStartSet(join(COMMITTED_DIR, 'start-0-points-5-conics.json')));
})();

/**
 * Certification cases (paths = points certified, found = certified distinct, failedPaths = points not certified).
 * The five-conic case certifies the committed generic solution set (3264 conics tangent to five
 * random complex conics, Chasles 1864; tangency-point formulation, 16 unknowns) on two worker threads; workers stay
 * warm between runs, as in a long solve session. The quadric cases use systems of our own with solutions placed first.
 */
export const cases: BenchCase[] = [
  {
    name: 'certify: 3264 conics tangent to five conics (16 unknowns, 2 workers)',
    expected: 3264,
    async run() {
      const set = fiveConics();
      const system = tangencySystem(set.shape, set.chart);
      const report = await certifySolutionsParallel(system, set.parameters, set.solutions, { workers: 2 });
      return { paths: set.solutions.length, found: report.certifiedDistinct, failedPaths: set.solutions.length - report.certified };
    },
  },
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
