import type { PolynomialSystem } from '../expr/node.ts';
import { degree, groupDegrees } from '../expr/degree.ts';
import { validateGroups } from './groups.ts';

/** Bézout's bound ∏ deg f_i (degrees read off the graph: upper bounds). Throws for a non-square system. */
export function bezoutBound(system: PolynomialSystem): number {
  validateGroups(system);
  return system.equations.reduce((p, e) => p * degree(e), 1);
}

/**
 * The multihomogeneous Bézout number (Morgan–Sommese, Appl. Math. Comput. 24, 1987): the coefficient of
 * ∏_g z_g^{k_g} in ∏_i Σ_g d_ig·z_g, with k_g the size of group g (group g ↔ P^{k_g}); null when the system
 * has no groups. Computed exactly by dynamic programming over how many equations each group has taken.
 */
export function multihomogeneousBound(system: PolynomialSystem): number | null {
  if (!system.groups) return null;
  const groups = validateGroups(system, system.groups);
  return multihomogeneousCount(groupDegrees(system.equations, groups), groups.map((g) => g.length));
}

/** The coefficient of ∏ z_g^{sizes[g]} in ∏_i Σ_g degrees[i][g]·z_g. */
export function multihomogeneousCount(degrees: readonly (readonly number[])[], sizes: readonly number[]): number {
  const key = (c: readonly number[]): string => c.join(',');
  let table = new Map<string, { counts: number[]; value: number }>([[key(sizes.map(() => 0)), { counts: sizes.map(() => 0), value: 1 }]]);
  for (const row of degrees) {
    const next = new Map<string, { counts: number[]; value: number }>();
    for (const { counts, value } of table.values()) {
      row.forEach((d, g) => {
        if (d === 0 || counts[g]! >= sizes[g]!) return;
        const c = counts.slice();
        c[g]!++;
        const k = key(c);
        const entry = next.get(k);
        if (entry) entry.value += value * d;
        else next.set(k, { counts: c, value: value * d });
      });
    }
    table = next;
  }
  return table.get(key(sizes))?.value ?? 0;
}
