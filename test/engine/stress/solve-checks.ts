import { expect } from 'vitest';
import type { FoundSolution, SolveReport } from '../../../src/engine/solve/solve-system.ts';
import { solveSystem } from '../../../src/engine/solve/solve-system.ts';
import { distInf, normInf } from '../../../src/engine/complex/packed.ts';
import type { StressSystem } from '../../../generators/bench/stress/stress-system.ts';

const reports = new Map<string, Promise<SolveReport>>();

/** The total-degree solve of a corpus system with its own seed, memoised by name so several tests share one solve. */
export function solveOnce(s: StressSystem): Promise<SolveReport> {
  let report = reports.get(s.name);
  if (report === undefined) {
    report = solveSystem(s.system, s.parameters, { seed: s.seed, start: 'total-degree' });
    reports.set(s.name, report);
  }
  return report;
}

/** The figures a failure message should show at once: distinct nonsingular found, and where the paths went. */
export function outcome(report: SolveReport): { found: number; failed: number; singular: number; excess: number; atInfinity: number; regular: number } {
  const { failed, singular, excess, atInfinity, regular } = report.stats;
  return { found: report.solutions.length, failed, singular, excess, atInfinity, regular };
}

/**
 * Every path of the start system is tracked and lands in exactly one place: the outcome counts add up to the Bézout
 * number, and the paths named by the solutions and singular clusters, with the excess, at-infinity and failed ends,
 * are each path index exactly once.
 */
export function expectEveryPathAccountedFor(report: SolveReport): void {
  const { tracked, regular, singular, excess, atInfinity, failed } = report.stats;
  expect(tracked).toBe(report.bezoutBound);
  expect(report.ends).toHaveLength(tracked);
  expect(regular + singular + excess + atInfinity + failed).toBe(tracked);
  const elsewhere = report.ends.flatMap((e, k) => (e.outcome === 'at-infinity' || e.outcome === 'failed' || e.outcome === 'excess' ? [k] : []));
  const named = [...report.solutions, ...report.singular].flatMap((s) => s.paths);
  expect([...named, ...elsewhere].sort((a, b) => a - b)).toEqual(Array.from({ length: tracked }, (_, k) => k));
}

/**
 * Pairs the mapped base solutions with the variant's solutions: a mapped point y matches a solution z when
 * ‖z − y‖∞ ≤ tolerance·‖y‖∞ (relative, so scale-free). Returns how many mapped base points found no match, how many
 * variant solutions matched no mapped point, and the worst relative distance over the matched pairs.
 */
export function compareMapped(base: readonly FoundSolution[], variant: readonly FoundSolution[], map: (x: Float64Array) => Float64Array, tolerance: number): { unmatchedBase: number; unmatchedVariant: number; worst: number } {
  const used = new Set<number>();
  let unmatchedBase = 0, worst = 0;
  for (const b of base) {
    const y = map(b.point);
    const size = normInf(y);
    let best = -1, bestDistance = Infinity;
    variant.forEach((v, k) => {
      if (used.has(k)) return;
      const d = distInf(v.point, y) / size;
      if (d < bestDistance) { bestDistance = d; best = k; }
    });
    if (best >= 0 && bestDistance <= tolerance) { used.add(best); worst = Math.max(worst, bestDistance); } else unmatchedBase++;
  }
  return { unmatchedBase, unmatchedVariant: variant.length - used.size, worst };
}
