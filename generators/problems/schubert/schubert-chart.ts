import type { FormulationDefinition } from '../../../src/atlas/definition.ts';
import type { ExprNode } from '../../../src/engine/index.ts';
import { meetingDeterminant } from './subspace-meeting.ts';

/** Coordinates of affine (n − 1)-space, in order; the homogeneous coordinate x₀ = 1 comes first. */
export const AXES = ['x', 'y', 'z', 'w', 'v'] as const;
const ROW_LETTERS = ['a', 'b', 'c'] as const;
const DIRECTION_LETTERS = ['e', 'f', 'g'] as const;

/**
 * The shape of a Schubert problem: k-dimensional subspaces of n-space (projective (k−1)-planes in P^{n−1}) meeting
 * `conditions` = k(n − k) given (n − k)-dimensional subspaces, each given in the affine chart x₀ = 1 by a point and
 * n − k − 1 directions in (n − 1)-space.
 */
export interface SchubertShape {
  readonly k: number;
  readonly n: number;
}

/** The number of given subspaces, k(n − k) (the dimension of the Grassmannian). */
export function conditionCount({ k, n }: SchubertShape): number {
  return k * (n - k);
}

/** The unknowns of the Stiefel chart [I_k | X]: row r of X is named a1, a2, … (r = 1), b1, … (r = 2), c1, … (r = 3). */
export function chartUnknowns({ k, n }: SchubertShape): string[][] {
  return ROW_LETTERS.slice(0, k).map((letter) => Array.from({ length: n - k }, (_, c) => `${letter}${c + 1}`));
}

/** The parameter names of given subspace j (1-based): its point p{j}{axis}, then its directions e{j}{axis}, f{j}{axis}, …. */
export function subspaceParameters({ k, n }: SchubertShape, j: number): { point: string[]; directions: string[][] } {
  const axes = AXES.slice(0, n - 1);
  return {
    point: axes.map((a) => `p${j}${a}`),
    directions: DIRECTION_LETTERS.slice(0, n - k - 1).map((d) => axes.map((a) => `${d}${j}${a}`)),
  };
}

/** Every parameter name, subspace by subspace. */
export function chartParameters(shape: SchubertShape): string[] {
  return Array.from({ length: conditionCount(shape) }, (_, i) => subspaceParameters(shape, i + 1)).flatMap(({ point, directions }) => [...point, ...directions.flat()]);
}

/** Total-degree bound k^{k(n−k)} of the chart formulation (each equation has degree k), exact while below 2^53. */
export function chartBezoutBound(shape: SchubertShape): number {
  return shape.k ** conditionCount(shape);
}

/**
 * Whether the chart formulation can drop the common top-degree form: when n = 2k the only degree-k term of every
 * equation is det X times a constant of its given subspace, so all but the first equation can be made of degree k − 1.
 */
export function sharesTopForm({ k, n }: SchubertShape): boolean {
  return n === 2 * k;
}

/** Total-degree bound of the reduced chart formulation (n = 2k): one equation of degree k, the rest of degree k − 1. */
export function reducedBezoutBound(shape: SchubertShape): number {
  return shape.k * (shape.k - 1) ** (conditionCount(shape) - 1);
}

/** Multihomogeneous bound with the rows of X as groups (each equation multilinear in them): (k(n−k))! / ((n−k)!)^k. */
export function chartRowGroupBound({ k, n }: SchubertShape): number {
  const factorial = (m: number): number => (m <= 1 ? 1 : m * factorial(m - 1));
  return factorial(k * (n - k)) / factorial(n - k) ** k;
}

/**
 * The formulation in the Stiefel chart: the solution is the row space of [I_k | X] (homogeneous coordinates
 * x₀, …, x_{n−1}), and it meets given subspace j, the span of (1, p_j), (0, e_j), (0, f_j), …, exactly when the n × n
 * determinant E_j stacking both bases vanishes: one equation of degree k, multilinear in the rows of X.
 * With `reduce` (only when n = 2k) equations j ≥ 2 become m₁E_j − m_jE₁, where m_j is the minor of subspace j's basis
 * on the first k columns; their det X terms cancel exactly (the term is left out of both), so they have degree k − 1.
 * The systems agree wherever m₁ ≠ 0 (general data).
 */
export function chartFormulation(shape: SchubertShape, description: string, reduce = false): FormulationDefinition {
  if (reduce && !sharesTopForm(shape)) throw new RangeError(`chartFormulation: the top form is shared only when n = 2k, got k = ${shape.k}, n = ${shape.n}`);
  const { k } = shape;
  const rows = chartUnknowns(shape);
  return {
    unknowns: rows.flat(),
    parameters: chartParameters(shape),
    groups: rows,
    description,
    equations: (u, q, ops) => {
      const top: ExprNode[][] = rows.map((names, r) => [
        ...Array.from({ length: k }, (_, c) => ops.constant(c === r ? 1 : 0)),
        ...names.map((name) => u[name]!),
      ]);
      const bottoms = Array.from({ length: conditionCount(shape) }, (_, i) => {
        const { point, directions } = subspaceParameters(shape, i + 1);
        return [
          [ops.constant(1), ...point.map((name) => q[name]!)],
          ...directions.map((names) => [ops.constant(0), ...names.map((name) => q[name]!)]),
        ];
      });
      if (!reduce) return bottoms.map((bottom) => meetingDeterminant(ops, top, bottom));
      const xColumns = Array.from({ length: shape.n - k }, (_, c) => k + c);
      const minor = (bottom: readonly ExprNode[][]) => ops.det(bottom.map((row) => row.slice(0, k)));
      const rest = bottoms.map((bottom) => meetingDeterminant(ops, top, bottom, xColumns));
      return [
        meetingDeterminant(ops, top, bottoms[0]!),
        ...bottoms.slice(1).map((bottom, i) => ops.sub(ops.mul(minor(bottoms[0]!), rest[i + 1]!), ops.mul(minor(bottom), rest[0]!))),
      ];
    },
  };
}
