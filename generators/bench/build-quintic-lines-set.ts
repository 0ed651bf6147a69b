import { join } from 'node:path';
import { closeSharedPool, createPoolLegTracker, createRandom, discoverByMonodromy, sharedPool } from '../../src/engine/index.ts';
import { readSetOf, STORED_SET_CACHE_DIR } from '../problems/shared/stored-set.ts';
import { storedSetPaths, writeStoredSet } from '../problems/shared/stored-set-file.ts';
import { quinticLinesSpec } from '../problems/surfaces/quintic-lines-store.ts';

// Builds the committed stored set of the quintic's 2875 lines by monodromy on a pool of workers and prints the
// figures. Round 0 starts from the spec's solution-first seed (random source spec.seed); round k ≥ 1 resumes from the
// solutions the previous round left in the cache (random source spec.seed + k), so a round that saturates short of
// 2875 is not lost. The set is written beside the definitions only once it holds exactly 2875 lines.
// Usage: node --experimental-strip-types generators/bench/build-quintic-lines-set.ts [workers] [round]
const workers = Number(process.argv[2] ?? 2), round = Number(process.argv[3] ?? 0);
const spec = quinticLinesSpec;
const partialName = `${spec.name}-partial`;
const started = performance.now();
const pool = await sharedPool(workers);
try {
  const random = createRandom(spec.seed + round);
  const seed = round === 0
    ? spec.seedBuilder(random)
    : (() => { const set = readSetOf({ ...spec, name: partialName }, storedSetPaths(STORED_SET_CACHE_DIR, partialName).header); return { parameters: set.parameters, solutions: set.solutions }; })();
  const track = createPoolLegTracker(pool, { url: spec.homotopy.url, constants: spec.homotopy.constants(new Float64Array(0)) });
  const monodromy = await discoverByMonodromy({ track, seed, random, expected: spec.expected, maxNodes: 8, confirmations: 3 });
  const set = { name: spec.name, shape: spec.shape, seed: spec.seed, chart: new Float64Array(0), parameters: monodromy.parameters, solutions: monodromy.solutions };
  writeStoredSet({ ...set, name: partialName }, STORED_SET_CACHE_DIR);
  const file = monodromy.solutions.length === spec.expected ? writeStoredSet(set, spec.dir) : join(STORED_SET_CACHE_DIR, `${partialName}.json`);
  const { steps, ...stats } = monodromy.stats;
  const medianSteps = [...steps].sort((a, b) => a - b)[Math.floor(steps.length / 2)];
  process.stdout.write(`${JSON.stringify({ round, file, count: set.solutions.length, stop: monodromy.stop, seconds: (performance.now() - started) / 1000, ...stats, medianSteps })}\n`);
} finally {
  await closeSharedPool();
}
