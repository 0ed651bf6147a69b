// Shared by the build (static table pages) and the browser (<solutions-table>): plain data, no DOM, no Node.
import type { Solution } from '../../atlas/record.ts';

/** One table row: a solution with its index in the record (0-based; shown as index + 1). */
export interface SolutionRow {
  readonly index: number;
  readonly values: readonly (readonly [number, number])[];
  readonly residual: number;
  readonly condition: number | null;
  readonly real: boolean;
  readonly certified: boolean;
  readonly certifiedReal: boolean;
}

/** The rows of an instance's solutions, each keeping its record index. */
export function solutionRows(solutions: readonly Solution[]): SolutionRow[] {
  return solutions.map((s, index) => ({
    index, values: s.values, residual: s.residual, condition: s.condition, real: s.real, certified: s.certified, certifiedReal: s.certifiedReal,
  }));
}

/** The instance's rows as compact JSON for the browser: [index, real, certified, certifiedReal, residual, condition, re₀, im₀, re₁, im₁, …]. */
export function packRows(rows: readonly SolutionRow[]): (number | boolean | null)[][] {
  return rows.map((r) => [r.index, r.real, r.certified, r.certifiedReal, r.residual, r.condition, ...r.values.flat()]);
}

/** Inverse of packRows; throws naming the row when a packed row is malformed. */
export function unpackRows(packed: readonly (readonly unknown[])[], coordinates: number): SolutionRow[] {
  return packed.map((p, k) => {
    if (p.length !== 6 + 2 * coordinates) throw new Error(`solution row ${k}: ${p.length} fields, expected ${6 + 2 * coordinates}`);
    const values: [number, number][] = [];
    for (let j = 0; j < coordinates; j++) values.push([Number(p[6 + 2 * j]), Number(p[7 + 2 * j])]);
    return {
      index: Number(p[0]), real: p[1] === true, certified: p[2] === true, certifiedReal: p[3] === true,
      residual: Number(p[4]), condition: p[5] === null ? null : Number(p[5]), values,
    };
  });
}
