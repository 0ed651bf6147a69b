import type { Homotopy } from '../homotopy.ts';

/** min over groups g of |x_h| / max_{j ∈ g} |x_j| (h: the group's homogenising coordinate, listed LAST; NaN for a zero group). */
export function projectiveInfinityDistance(x: Float64Array, groups: readonly (readonly number[])[]): number {
  let d = Infinity;
  for (const g of groups) {
    let m = 0;
    for (const j of g) m = Math.max(m, Math.hypot(x[2 * j]!, x[2 * j + 1]!));
    const h = g[g.length - 1]!;
    d = Math.min(d, Math.hypot(x[2 * h]!, x[2 * h + 1]!) / m);
  }
  return d;
}

/**
 * Adds the distance to infinity for multiprojective coordinates: `groups[g]` lists the coordinate indices of
 * group g with its homogenising coordinate LAST; the distance is projectiveInfinityDistance (and per group, for the
 * endgame's divergence test).
 */
export function withProjectiveGroups(homotopy: Homotopy, groups: readonly (readonly number[])[]): Homotopy {
  const infinityDistance = (x: Float64Array): number => projectiveInfinityDistance(x, groups);
  const single = groups.map((g) => [g]);
  const out: { -readonly [K in keyof Homotopy]: Homotopy[K] } = {
    n: homotopy.n,
    evaluate: (x, tRe, tIm, h, jac, ht) => homotopy.evaluate(x, tRe, tIm, h, jac, ht),
    infinityDistance,
    infinityGroups: groups.length,
    groupInfinityDistance: (x, g) => projectiveInfinityDistance(x, single[g]!),
  };
  if (homotopy.evaluateValue) out.evaluateValue = (x, tRe, tIm, h) => homotopy.evaluateValue!(x, tRe, tIm, h);
  if (homotopy.evaluateValueExtended) out.evaluateValueExtended = (x, tRe, tIm, h) => homotopy.evaluateValueExtended!(x, tRe, tIm, h);
  if (homotopy.createSolver) out.createSolver = () => homotopy.createSolver!();
  return out;
}
