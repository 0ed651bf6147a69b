import type { Homotopy } from '../homotopy.ts';

/**
 * Adds the at-infinity test for multiprojective coordinates: `groups[g]` lists the coordinate indices of
 * group g with its homogenising coordinate LAST. x is at infinity when for some group
 * |x_h| ≤ tolerance · max_{j ∈ group} |x_j|.
 */
export function withProjectiveGroups(homotopy: Homotopy, groups: readonly (readonly number[])[]): Homotopy {
  const atInfinity = (x: Float64Array, tolerance: number): boolean => groups.some((g) => {
    let m = 0;
    for (const j of g) m = Math.max(m, Math.hypot(x[2 * j]!, x[2 * j + 1]!));
    const h = g[g.length - 1]!;
    return Math.hypot(x[2 * h]!, x[2 * h + 1]!) <= tolerance * m;
  });
  return { ...bind(homotopy), atInfinity };
}

function bind(h: Homotopy): Homotopy {
  const out: { -readonly [K in keyof Homotopy]: Homotopy[K] } = { n: h.n, evaluate: h.evaluate.bind(h) };
  if (h.evaluateValue) out.evaluateValue = h.evaluateValue.bind(h);
  if (h.createSolver) out.createSolver = h.createSolver.bind(h);
  return out;
}
