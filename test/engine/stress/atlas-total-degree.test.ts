import { describe, expect, it } from 'vitest';
import { problems } from '../../../generators/problems/index.ts';
import { systemOf } from '../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../src/atlas/parameters-of.ts';
import type { CountSource } from '../../../src/atlas/source.ts';
import { solveSystem } from '../../../src/engine/solve/solve-system.ts';
import { expectEveryPathAccountedFor, outcome } from './solve-checks.ts';

// Every atlas problem's shown formulation, solved the naive way: the total-degree homotopy at the generic instance
// (its recorded seed and random complex parameters), whatever solver the problem itself uses. The distinct
// nonsingular solutions must be exactly the problem's published count (trueCount.value, its source in the test name)
// with no failed path. The naive five-conic run (7776 paths of a sextic system) is too slow for CI and runs in the
// bench instead: `npm run bench -- --suite stress --only five-conic --runs 1`.
// The quintic-lines definition (not yet registered) has its naive 15625-path run in the same suite: `--only quintic`.
// The quintic's bitangents by total degree track 21504 paths (about 2 minutes on 2 cores): all 120 are found, but 128
// paths fail on the way to the surplus at infinity (measured 2026-12-05; engine README, Known limits). Its page solves
// them by the three-group homotopy (2400 paths, 0 failed).
const BENCH_ONLY = new Set(['conics-tangent-to-5-conics', 'bitangents-of-a-plane-quintic']);
// Out of reach of any total-degree run, bench included: the shown parametrised-map system of the rational quartics has
// Bézout bound 5^16 = 152587890625 (its page says so and solves it by monodromy and a stored set instead).
const OUT_OF_REACH = new Set(['rational-quartics-through-11-points']);

/** "Chasles 1864"-style label of a count's source (the test names carry it beside the count). */
function sourceLabel(source: CountSource): string {
  if (source.kind === 'published') return `${source.authors.map((a) => a.split(' ').at(-1)).join('–')} ${source.year}`;
  return source.kind === 'common-practice' ? 'common practice, no source' : `from memory: ${source.note}`;
}

const rows = problems
  .filter((p) => !BENCH_ONLY.has(p.slug) && !OUT_OF_REACH.has(p.slug) && p.trueCount.value !== null)
  .map((p) => ({ p, label: `${p.slug}: ${p.trueCount.value} (${sourceLabel(p.trueCount.source)})` }));

describe('every atlas problem solved by total degree at its generic instance', () => {
  it.each(rows)('$label: finds the published count with no failed path', async ({ p }) => {
    const instance = p.instances.find((i) => i.kind === 'generic')!;
    const report = await solveSystem(systemOf(p), parametersOf(p, instance), { seed: instance.seed, start: 'total-degree' });
    expectEveryPathAccountedFor(report);
    expect({ found: outcome(report).found, failed: report.stats.failed }).toEqual({ found: p.trueCount.value, failed: 0 });
  });

  it('leaves out of CI only the problems the bench runs', () => {
    expect(problems.filter((p) => BENCH_ONLY.has(p.slug)).map((p) => p.slug)).toEqual([...BENCH_ONLY]);
  });
});
