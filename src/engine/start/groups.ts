import type { PolynomialSystem } from '../expr/node.ts';

/**
 * Checks that the system is square and that `groups` (default: one group of all unknowns) partitions the
 * unknown indices; returns the groups. Throws RangeError naming the problem (equation/unknown counts, the
 * repeated or missing unknown, the group).
 */
export function validateGroups(system: PolynomialSystem, groups?: readonly (readonly number[])[]): readonly (readonly number[])[] {
  const n = system.unknowns.length;
  if (system.equations.length !== n) {
    throw new RangeError(`the system has ${system.equations.length} equations in ${n} unknowns; a square system is needed`);
  }
  if (n === 0) throw new RangeError('the system has no unknowns');
  const g = groups ?? [Array.from({ length: n }, (_, i) => i)];
  const seen = new Array<number>(n).fill(-1);
  g.forEach((group, k) => {
    if (group.length === 0) throw new RangeError(`variable group ${k} is empty`);
    for (const j of group) {
      if (!Number.isInteger(j) || j < 0 || j >= n) throw new RangeError(`variable group ${k}: unknown index ${j} is outside 0..${n - 1}`);
      if (seen[j] !== -1) throw new RangeError(`unknown ${system.unknowns[j]} (index ${j}) is in groups ${seen[j]} and ${k}`);
      seen[j] = k;
    }
  });
  const missing = seen.indexOf(-1);
  if (missing >= 0) throw new RangeError(`unknown ${system.unknowns[missing]} (index ${missing}) is in no variable group`);
  return g;
}
