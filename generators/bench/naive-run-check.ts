// Re-measures the naive-run figures a conic page shows and says when they differ from the recorded constant:
//   node --experimental-strip-types generators/bench/naive-run-check.ts [workers]
// Exit 0 when every figure agrees, 1 when one differs (the differences and the figures to paste go to stdout).
import { closeSharedPool } from '../../src/engine/index.ts';
import fiveConics from '../problems/conics/conics-tangent-to-5-conics.ts';
import { NAIVE_FIVE_CONICS_RUN } from '../problems/conics/naive-run-figures.ts';
import { naiveRun } from './naive-run.ts';
import { naiveRunDifferences } from './naive-run-differences.ts';

const workers = Number(process.argv[2] ?? 2);
const recorded = NAIVE_FIVE_CONICS_RUN;
const { stepsMedian, seconds, ...measured } = await naiveRun(fiveConics, recorded.instance, recorded.seed, workers, recorded.rankOneTolerance);
await closeSharedPool();
const differences = naiveRunDifferences(recorded, measured);
console.log(`naive run of ${recorded.slug}: ${measured.paths} paths, median ${stepsMedian} steps, ${seconds.toFixed(1)} s on ${workers} workers`);
if (differences.length === 0) {
  console.log('the figures in generators/problems/conics/naive-run-figures.ts agree with this measurement');
} else {
  console.log(`differs from generators/problems/conics/naive-run-figures.ts:\n  ${differences.join('\n  ')}\nmeasured figures:\n${JSON.stringify(measured, null, 2)}`);
  process.exitCode = 1;
}
