// Builds and writes the committed stored set of rational maps of one degree: node --experimental-strip-types
// generators/problems/rational-curves/build-map-set.ts <degree> [workers]. Monodromy from the spec's solution-first seed
// (two workers by default), allowed up to 12 nodes and stopping at the published count, or when 4 added nodes in a row
// bring nothing new (then it throws: a set short of the count is never written); prints the discovery statistics.
import { closeSharedPool, createPoolLegTracker, createRandom, discoverByMonodromy, sharedPool } from '../../../src/engine/index.ts';
import { writeStoredSet } from '../shared/stored-set-file.ts';
import { kontsevichNumbers } from './kontsevich-numbers.ts';
import { mapStoreSpec, MAP_SET_SEEDS } from './map-store.ts';

const degree = Number(process.argv[2] ?? 4), workers = Number(process.argv[3] ?? 2);
const spec = mapStoreSpec(degree, MAP_SET_SEEDS[degree]!, Number(kontsevichNumbers(degree)[degree - 1]));
const began = performance.now();
const random = createRandom(spec.seed);
const { chart, parameters, solution } = spec.seedBuilder(random);
const pool = await sharedPool(workers);
const track = createPoolLegTracker(pool, { url: spec.homotopy.url, constants: spec.homotopy.constants(chart), settings: spec.homotopy.settings });
const monodromy = await discoverByMonodromy({ track, seed: { parameters, solution }, random, expected: spec.expected, maxNodes: 12, confirmations: 4 });
await closeSharedPool();
const m = monodromy.stats;
console.log(`${spec.name}: ${monodromy.solutions.length} (${monodromy.stop}), ${m.paths} paths, ${m.failedPaths} failed, ${m.jumps} jumps (${m.unresolvedJumps} unresolved), ${m.nodes} nodes, ${m.edges} edges, ${m.rounds} rounds, ${((performance.now() - began) / 1000).toFixed(0)} s`);
if (monodromy.solutions.length !== spec.expected) throw new Error(`${spec.name}: monodromy found ${monodromy.solutions.length}, not the published ${spec.expected}; nothing written`);
console.log(writeStoredSet({ name: spec.name, shape: spec.shape, seed: spec.seed, chart, parameters: monodromy.parameters, solutions: monodromy.solutions }, spec.dir));
