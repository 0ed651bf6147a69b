import { systemOf } from '../../src/atlas/system-of.ts';
import { parametersOf } from '../../src/atlas/parameters-of.ts';
import { solveSystem } from '../../src/engine/index.ts';
import quinticLines from './naive-quintic-lines-problem.ts';
import type { BenchCase } from './bench-case.ts';

/**
 * The naive total-degree run on the quintic-lines chart formulation at its generic instance (5⁶ = 15625 paths, two
 * workers): found = distinct lines, expected 2875 (Schubert 1879). Where the other paths ended goes to stderr.
 */
export const naiveQuinticLinesCase: BenchCase = {
  name: 'lines on a quintic threefold: naive total-degree homotopy on the chart formulation, 15625 paths, 2 workers',
  expected: 2875,
  async run() {
    const instance = quinticLines.instances.find((i) => i.kind === 'generic')!;
    const report = await solveSystem(systemOf(quinticLines), parametersOf(quinticLines, instance), { seed: instance.seed, start: 'total-degree', workers: 2 });
    const s = report.stats;
    process.stderr.write(`naive quintic lines: ${report.solutions.length} lines, ${s.regular} regular, ${s.singular} singular, ${s.atInfinity} at infinity, ${s.failed} failed, ${report.seconds.toFixed(1)} s\n`);
    return { paths: report.ends.length, found: report.solutions.length, failedPaths: s.failed };
  },
};
