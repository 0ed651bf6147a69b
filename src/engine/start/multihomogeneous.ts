import type { ExprNode } from '../expr/node.ts';
import { add, mul, unknown } from '../expr/build.ts';
import type { RandomSource } from '../random.ts';
import { createDenseLU } from '../linalg/dense-lu.ts';
import type { ParameterBank, StartSystem } from './start-system.ts';

/**
 * The linear-product start system of Morgan–Sommese (Appl. Math. Comput. 24, 1987): G_i = ∏_g ∏_{k<d_ig} ℓ_igk
 * with ℓ_igk a random complex linear form in group g's coordinates (its unknowns and h_g = X_{n+g}).
 * Coordinates of group g are coords[g] = [...groups[g], n + g]; charts[g] are packed coefficients over coords[g].
 * A start solution picks, for each equation, one group g and one factor of ℓ_ig·, each group g picked exactly
 * |group g| times; each group's coordinates then solve |g| linear forms plus the chart (dense LU). The count is
 * the multihomogeneous Bézout number. Path order: equations in order, each trying groups then factors in order.
 * Random draws: the forms, in equation, group, factor, coordinate order; their coefficients become bank parameters.
 */
export function multihomogeneousStart(
  degrees: readonly (readonly number[])[],
  groups: readonly (readonly number[])[],
  charts: readonly Float64Array[],
  random: RandomSource,
  bank: ParameterBank,
): StartSystem {
  const n = degrees.length, G = groups.length, N = n + G;
  const coords = groups.map((g, k) => [...g, n + k]);
  const forms = degrees.map((row) => row.map((d, g) => Array.from({ length: d }, () => {
    const c = new Float64Array(2 * coords[g]!.length);
    for (let k = 0; k < coords[g]!.length; k++) random.gaussianComplex(c, 2 * k);
    return c;
  })));
  const equations: ExprNode[] = forms.map((row) => mul(...row.flatMap((list, g) => list.map((c) => linearForm(coords[g]!, c, bank)))));
  degrees.forEach((row, i) => {
    if (row.every((d) => d === 0)) throw new RangeError(`equation ${i} has degree 0 in every group`);
  });
  const chosen: { g: number; k: number }[] = [];
  const taken = new Array<number>(G).fill(0);
  const points: Float64Array[] = [];
  const solvers = coords.map((c) => ({ lu: createDenseLU(c.length), m: new Float64Array(2 * c.length * c.length), b: new Float64Array(2 * c.length) }));
  const emit = (): void => {
    const X = new Float64Array(2 * N);
    for (let g = 0; g < G; g++) {
      const size = coords[g]!.length, { lu, m, b } = solvers[g]!;
      let row = 0;
      chosen.forEach((pick, i) => {
        if (pick.g !== g) return;
        m.set(forms[i]![g]![pick.k]!, 2 * size * row);
        row++;
      });
      m.set(charts[g]!, 2 * size * row);
      b.fill(0);
      b[2 * (size - 1)] = 1;
      if (!Number.isFinite(lu.factor(m))) throw new Error('multihomogeneous start system: singular linear system (non-generic random forms)');
      lu.solve(b, b);
      coords[g]!.forEach((j, k) => { X[2 * j] = b[2 * k]!; X[2 * j + 1] = b[2 * k + 1]!; });
    }
    points.push(X);
  };
  const visit = (i: number): void => {
    if (i === n) { emit(); return; }
    for (let g = 0; g < G; g++) {
      if (taken[g]! >= groups[g]!.length) continue;
      for (let k = 0; k < degrees[i]![g]!; k++) {
        chosen[i] = { g, k };
        taken[g]!++;
        visit(i + 1);
        taken[g]!--;
      }
    }
  };
  visit(0);
  const starts = new Float64Array(2 * N * points.length);
  points.forEach((p, k) => starts.set(p, 2 * N * k));
  return { equations, count: points.length, starts };
}

function linearForm(coords: readonly number[], c: Float64Array, bank: ParameterBank): ExprNode {
  return add(...coords.map((j, k) => mul(bank.add(c[2 * k]!, c[2 * k + 1]!), unknown(`X${j}`, j))));
}
