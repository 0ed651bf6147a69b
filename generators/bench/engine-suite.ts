import { availableParallelism } from 'node:os';
import { createRandom, type PolynomialSystem, type SolveOptions, solveSystem } from '../../src/engine/index.ts';
import type { BenchCase, BenchOutcome } from './bench-case.ts';
import { bitangents, linesOnCubic, randomSystem } from './engine-systems.ts';

/** Solves each system (one solve each, in order) and sums what the bench reports. */
async function solveAll(systems: readonly PolynomialSystem[], options: Omit<SolveOptions, 'seed'>): Promise<BenchOutcome> {
  let paths = 0, found = 0, failedPaths = 0;
  const steps: number[] = [];
  for (const [k, system] of systems.entries()) {
    const r = await solveSystem(system, new Float64Array(0), { ...options, seed: 7000 + k });
    paths += r.stats.tracked;
    found += r.solutions.length;
    failedPaths += r.stats.failed;
    steps.push(...r.ends.map((e) => e.steps));
  }
  return { paths, found, failedPaths, steps };
}

const cores = availableParallelism();
const batch = (make: (seed: number) => PolynomialSystem, count: number): PolynomialSystem[] => Array.from({ length: count }, (_, k) => make(100 + k));

/**
 * The engine's own cases, each with its published count: Bézout (1779) for conics and cubics; Cayley (1849),
 * Salmon (1849) for the 27 lines; Plücker (1834) for the 28 bitangents. Batches of small instances make the
 * timings measurable; "workers" cases use the shared pool with one worker per core.
 */
export const cases: BenchCase[] = [
  { name: 'two conics ×50 (total degree, 4 paths each)', expected: 200, run: () => solveAll(batch((s) => randomSystem(createRandom(s), 2, 2), 50), {}) },
  { name: 'two cubics ×20 (total degree, 9 paths each)', expected: 180, run: () => solveAll(batch((s) => randomSystem(createRandom(s), 2, 3), 20), {}) },
  { name: '27 lines on a cubic surface (total degree, 81 paths)', expected: 27, run: () => solveAll([linesOnCubic(createRandom(3))], {}) },
  { name: '27 lines on a cubic surface (two groups, 45 paths)', expected: 27, run: () => solveAll([linesOnCubic(createRandom(3))], { start: 'multihomogeneous' }) },
  { name: '28 bitangents of a quartic (two groups, 288 paths)', expected: 28, run: () => solveAll([bitangents(createRandom(3))], { start: 'multihomogeneous' }) },
  { name: `27 lines ×4 (total degree, 81 paths each, ${cores} workers)`, expected: 108, run: () => solveAll(batch((s) => linesOnCubic(createRandom(s)), 4), { workers: cores }) },
  { name: `28 bitangents (two groups, 288 paths, ${cores} workers)`, expected: 28, run: () => solveAll([bitangents(createRandom(3))], { start: 'multihomogeneous', workers: cores }) },
];
