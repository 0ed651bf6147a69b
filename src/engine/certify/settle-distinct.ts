import type { PointCertificate } from './certify-point.ts';
import type { CertificationReport, CertifiedSolution } from './certification-report.ts';
import { overlapGroups } from './overlap-groups.ts';

/**
 * Turns per-point certificates into a report. Certified enclosures are grouped by overlap; each group's region is
 * disjoint from the others', so groups count as distinct solutions. In a group of several boxes the hull is tested:
 * a pass proves they all hold the same solution (sameAs the first); a failure leaves the group counted once, with a
 * reason on the later members (distinctness among them not proven).
 */
export function settleDistinct(
  results: readonly PointCertificate[],
  n: number,
  hull: (box: Float64Array) => boolean,
  seconds: number,
): CertificationReport {
  const solutions: CertifiedSolution[] = results.map((r) => ({ ...r }));
  const certifiedIndices = solutions.flatMap((s, i) => (s.certified ? [i] : []));
  // each solution lies in its enclosure K(X) ⊂ X, so disjoint enclosures already prove different solutions
  const groupOf = overlapGroups(certifiedIndices.map((i) => solutions[i]!.enclosure), n);
  const members = new Map<number, number[]>();
  groupOf.forEach((g, k) => {
    const list = members.get(g);
    if (list) list.push(certifiedIndices[k]!); else members.set(g, [certifiedIndices[k]!]);
  });
  let certifiedReal = 0;
  for (const list of members.values()) {
    if (list.some((i) => solutions[i]!.certifiedReal)) certifiedReal++;
    if (list.length === 1) continue;
    const box = solutions[list[0]!]!.box.slice();
    for (const i of list) {
      const b = solutions[i]!.box;
      for (let k = 0; k < b.length; k += 2) { box[k] = Math.min(box[k]!, b[k]!); box[k + 1] = Math.max(box[k + 1]!, b[k + 1]!); }
    }
    const same = hull(box);
    for (const i of list.slice(1)) {
      if (same) {
        solutions[i]!.sameAs = list[0]!;
        solutions[i]!.reason = `same solution as ${list[0]}: the hull of their boxes holds exactly one`;
      } else {
        solutions[i]!.reason = `box overlaps that of solution ${list[0]}; distinctness not proven`;
      }
    }
  }
  return { solutions, certified: certifiedIndices.length, certifiedDistinct: members.size, certifiedReal, seconds };
}
