import type { PolynomialSystem } from '../expr/node.ts';
import type { PathEnd } from '../homotopy.ts';
import { compiledTarget } from './compiled-target.ts';
import { createAffineTools } from './affine.ts';
import { naturalUnits } from '../start/natural-units.ts';
import { isRealPoint } from './real.ts';
import { pathStatistics } from './statistics.ts';
import type { FoundSolution, RetrackSummary, SolveBounds, SolveReport } from './types.ts';

/** Two refined regular ends closer than this (AffineTools.distance, natural units) are one solution. */
export const REGULAR_CLUSTER_TOLERANCE = 1e-8;
/** Ends of which one is singular cluster at this looser relative distance (endgame accuracy). */
export const SINGULAR_CLUSTER_TOLERANCE = 1e-5;

/**
 * Post-processing only (deterministic, no tracking): refines each finite regular end by Newton's method on
 * F(·; parameters) (relative 1e-13 in natural units, ≤ 5 iterations, best iterate kept), clusters finite ends in path order
 * (first match wins; tolerances above), and reports clusters whose members are all regular as solutions, the
 * others as singular clusters (multiplicity = paths ending there; point = mean of the members). Both lists are
 * sorted by their points (9 significant digits per coordinate, re before im, then exactly). `firstPath` offsets
 * the path indices (for one shard's ends). Concatenated shard ends give the same report as one run.
 */
export function collectSolutions(system: PolynomialSystem, parameters: Float64Array, ends: readonly PathEnd[], bounds: SolveBounds, firstPath = 0): SolveReport {
  const compiled = compiledTarget(system);
  const tools = createAffineTools(compiled, parameters, naturalUnits(system, parameters));
  const clusters: { point: Float64Array; paths: number[]; regular: boolean; members: Float64Array[] }[] = [];
  ends.forEach((end, k) => {
    if (end.outcome !== 'regular' && end.outcome !== 'singular') return;
    const x = Float64Array.from(end.point);
    const regular = end.outcome === 'regular';
    if (regular) tools.newton(x, 1e-13, 5);
    const home = clusters.find((c) => tools.distance(c.point, x) <= (regular && c.regular ? REGULAR_CLUSTER_TOLERANCE : SINGULAR_CLUSTER_TOLERANCE));
    if (home) {
      home.paths.push(firstPath + k);
      home.members.push(x);
      home.regular &&= regular;
    } else {
      clusters.push({ point: x, paths: [firstPath + k], regular, members: [x] });
    }
  });
  const found = clusters.map((c): FoundSolution & { regular: boolean } => {
    let point = c.point;
    if (!c.regular) {
      point = new Float64Array(c.point.length);
      for (const m of c.members) for (let i = 0; i < m.length; i++) point[i] = point[i]! + m[i]! / c.members.length;
    }
    return { point, residual: tools.residual(point), condition: tools.condition(point), multiplicity: c.paths.length, real: isRealPoint(point), paths: c.paths, regular: c.regular };
  });
  const strip = ({ regular: _, ...s }: FoundSolution & { regular: boolean }): FoundSolution => s;
  return {
    ...bounds,
    ends: [...ends],
    solutions: found.filter((s) => s.regular).sort(byPoint).map(strip),
    singular: found.filter((s) => !s.regular).sort(byPoint).map(strip),
    stats: pathStatistics(ends),
    retracks: retrackSummary(ends, found.filter((s) => s.regular)),
    seconds: 0,
  };
}

/** Counts what the review did, read off the ends (so shards merged give the single run's counts). */
export function retrackSummary(ends: readonly PathEnd[], regular: readonly FoundSolution[]): RetrackSummary {
  const summary: RetrackSummary = { jumpPaths: 0, recoveredJumps: 0, unresolvedJumps: 0, extendedPaths: 0, extendedDecided: 0 };
  for (const e of ends) {
    if (!e.retrack) continue;
    if (e.retrack.reason === 'jump') {
      summary.jumpPaths++;
      if (e.retrack.changed) summary.recoveredJumps++;
    } else {
      summary.extendedPaths++;
      if (e.retrack.changed) summary.extendedDecided++;
    }
  }
  for (const s of regular) if (s.multiplicity > 1) summary.unresolvedJumps += s.multiplicity;
  return summary;
}

function byPoint(a: FoundSolution, b: FoundSolution): number {
  for (let i = 0; i < a.point.length; i++) {
    const d = Number(a.point[i]!.toPrecision(9)) - Number(b.point[i]!.toPrecision(9));
    if (d !== 0) return d;
  }
  for (let i = 0; i < a.point.length; i++) if (a.point[i] !== b.point[i]) return a.point[i]! - b.point[i]!;
  return a.paths[0]! - b.paths[0]!;
}
