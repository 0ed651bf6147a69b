import { createPoolLegTracker, closeSharedPool, sharedPool } from '../../src/engine/index.ts';
import { buildStoredSet } from '../problems/shared/stored-set.ts';
import { writeStoredSet } from '../problems/shared/stored-set-file.ts';
import { quinticLinesSpec } from '../problems/surfaces/quintic-lines-store.ts';

// Rebuilds the committed stored set of the quintic's 2875 lines by monodromy from the spec's solution-first seed, on
// a pool of workers (argument 1, default 2), and writes it beside the definitions. Prints the monodromy figures.
// Usage: node --experimental-strip-types generators/bench/build-quintic-lines-set.ts [workers]
const workers = Number(process.argv[2] ?? 2);
const started = performance.now();
const pool = await sharedPool(workers);
const spec = quinticLinesSpec;
try {
  const { set, monodromy } = await buildStoredSet(spec, (chart) => createPoolLegTracker(pool, { url: spec.homotopy.url, constants: spec.homotopy.constants(chart) }));
  const file = writeStoredSet(set, spec.dir);
  const { steps, ...stats } = monodromy.stats;
  const medianSteps = [...steps].sort((a, b) => a - b)[Math.floor(steps.length / 2)];
  process.stdout.write(`${JSON.stringify({ file, count: set.solutions.length, stop: monodromy.stop, seconds: (performance.now() - started) / 1000, ...stats, medianSteps })}\n`);
} finally {
  await closeSharedPool();
}
