import type { PolynomialSystem } from '../expr/node.ts';
import { unpackBatch, type CertifyBatch } from './certify-batch.ts';
import { prepareCertifier, realInstance, type CertificationReport, type Certifier, type CertifyOptions } from './certify-solutions.ts';
import type { CertifyWorkers } from './certify-workers-node.ts';
import { hasOnlyRealConstants } from './real-constants.ts';
import { settleDistinct } from './settle-distinct.ts';

/** Options of the parallel certifier: the number of worker threads (default: the machine's, at least 1). */
export interface ParallelCertifyOptions extends CertifyOptions {
  workers?: number;
}

let shared: { size: number; workers: Promise<CertifyWorkers>; seen: Set<string>[] } | null = null;
const keys = new WeakMap<PolynomialSystem, string>();
const local = new WeakMap<PolynomialSystem, Certifier>();
let keyCount = 0;

function keyOf(system: PolynomialSystem): string {
  let key = keys.get(system);
  if (key === undefined) { key = `system-${keyCount++}`; keys.set(system, key); }
  return key;
}

function localCertifier(system: PolynomialSystem): Certifier {
  let certifier = local.get(system);
  if (certifier === undefined) { certifier = prepareCertifier(system); local.set(system, certifier); }
  return certifier;
}

function workersOf(size: number): { workers: Promise<CertifyWorkers>; seen: Set<string>[] } {
  if (shared === null || shared.size !== size) {
    const old = shared;
    void old?.workers.then((w) => w.terminate());
    // the Node backend loads lazily, so browser bundles never see worker_threads
    shared = { size, workers: import('./certify-workers-node.ts').then((m) => m.createCertifyWorkers(size)), seen: Array.from({ length: size }, () => new Set()) };
  }
  return shared;
}

/** Ends the shared certification workers (they never keep Node alive while idle). */
export async function closeCertifyWorkers(): Promise<void> {
  const old = shared;
  shared = null;
  if (old !== null) await (await old.workers).terminate();
}

/**
 * certifySolutions over worker threads: the points are cut into batches that idle workers take in turn (each worker
 * compiles the system once and keeps it while the same system object comes back); distinctness is settled in the
 * calling thread. Same results as certifySolutions, whatever the number of workers. Workers stay warm between calls.
 */
export async function certifySolutionsParallel(
  system: PolynomialSystem,
  parameters: Float64Array,
  points: readonly Float64Array[],
  options: ParallelCertifyOptions = {},
): Promise<CertificationReport> {
  const started = performance.now();
  const size = Math.max(1, Math.floor(options.workers ?? globalThis.navigator?.hardwareConcurrency ?? 1));
  if (size === 1 || points.length < 64) return localCertifier(system).certify(parameters, points, options);
  const n = system.unknowns.length;
  if (system.equations.length !== n) throw new RangeError(`certification needs a square system: ${system.equations.length} equations in ${n} unknowns`);
  points.forEach((x, i) => {
    if (x.length !== 2 * n) throw new RangeError(`solution ${i} has ${x.length} numbers, expected ${2 * n} (packed complex)`);
  });
  const real = realInstance(hasOnlyRealConstants(system), parameters, options.realParameters);
  const { maxRadius, attempts } = options;
  const pointOptions = { ...(maxRadius === undefined ? {} : { maxRadius }), ...(attempts === undefined ? {} : { attempts }) };
  const key = keyOf(system);
  const pool = workersOf(size);
  let workers: CertifyWorkers;
  try {
    workers = await pool.workers;
  } catch {
    shared = null; // no worker_threads here (e.g. a browser): certify in this thread
    return localCertifier(system).certify(parameters, points, options);
  }
  const batchSize = Math.max(16, Math.min(512, Math.ceil(points.length / (4 * size))));
  let next = 0;
  const results = await workers.runAll((w): CertifyBatch | null => {
    if (next >= points.length) return null;
    const end = Math.min(points.length, next + batchSize);
    const packed = new Float64Array(2 * n * (end - next));
    for (let k = next; k < end; k++) packed.set(points[k]!, 2 * n * (k - next));
    next = end;
    const first = !pool.seen[w]!.has(key);
    pool.seen[w]!.add(key);
    return { key, ...(first ? { system } : {}), parameters, points: packed, real, options: pointOptions };
  });
  const certificates = results.flatMap((r) => unpackBatch(r, n));
  const hull = (box: Float64Array): boolean => localCertifier(system).holdsOneSolution(parameters, box);
  return settleDistinct(certificates, n, hull, (performance.now() - started) / 1000);
}
