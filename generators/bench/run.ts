// npm run bench [-- --runs N] [-- --only <substring>] [-- --suite <name>] [-- --json]
// Runs every case exported (as `cases`, or any exported array of cases) by every generators/bench/*-suite.ts (found by name, sorted) --runs times (default 5) and
// prints a table, or with --json ONLY a JSON array of {name, cores, runs, medianSeconds, paths, found, expected, failedPaths}.
import { readdirSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { closeSharedPool } from '../../src/engine/index.ts';
import type { BenchCase, BenchOutcome } from './bench-case.ts';
import { parseBenchArguments } from './bench-arguments.ts';
import { formatTable, sortedMedian, type BenchRow } from './bench-table.ts';

const options = parseBenchArguments(process.argv.slice(2));
const here = new URL('.', import.meta.url);
const suiteFiles = readdirSync(here).filter((f) => f.endsWith('-suite.ts') && (options.suite === undefined || f === `${options.suite}-suite.ts`)).sort();
if (suiteFiles.length === 0) throw new Error(`no bench suite file generators/bench/${options.suite}-suite.ts`);
const cases: BenchCase[] = [];
for (const file of suiteFiles) {
  const module = (await import(new URL(file, here).href)) as Record<string, unknown>;
  // `cases` by convention; any other exported array of cases counts too
  const found = [...new Set(Object.values(module))].filter((v): v is BenchCase[] => Array.isArray(v) && v.length > 0 && v.every(isBenchCase));
  if (found.length === 0) throw new Error(`generators/bench/${file} exports no array of bench cases ({ name, expected, run })`);
  for (const list of found) cases.push(...list);
}
const selected = cases.filter((c) => options.only === undefined || c.name.includes(options.only));
if (selected.length === 0) throw new Error(`no bench case matches --only ${options.only}`);

const cores = availableParallelism();
const rows: BenchRow[] = [];
for (const c of selected) {
  const seconds: number[] = [];
  let last: BenchOutcome | undefined;
  let failedPaths = 0;
  for (let run = 0; run < options.runs; run++) {
    const began = performance.now();
    last = await c.run();
    seconds.push((performance.now() - began) / 1000);
    failedPaths = Math.max(failedPaths, last.failedPaths);
  }
  rows.push({ name: c.name, cores, runs: options.runs, seconds, paths: last!.paths, found: last!.found, expected: c.expected, failedPaths, steps: last!.steps ? [...last!.steps] : undefined });
  if (!options.json) process.stderr.write(`done: ${c.name}\n`);
}
await closeSharedPool();
if (options.json) {
  process.stdout.write(`${JSON.stringify(rows.map(({ name, cores: k, runs, seconds, paths, found, expected, failedPaths: f }) => ({ name, cores: k, runs, medianSeconds: sortedMedian(seconds), paths, found, expected, failedPaths: f })), null, 2)}\n`);
} else {
  process.stdout.write(`${formatTable(rows)}\n`);
}

function isBenchCase(v: unknown): v is BenchCase {
  return typeof v === 'object' && v !== null && typeof (v as BenchCase).name === 'string' && typeof (v as BenchCase).run === 'function' && typeof (v as BenchCase).expected === 'number';
}
