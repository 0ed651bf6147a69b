import { createDenseLU, createRandom, exprBuilders, type ExprNode } from '../../../src/engine/index.ts';

const { constant, dot, mul } = exprBuilders;

/**
 * A change of coordinates applied to a system f: the variant is g(x) = f(φ(x)), built by putting the nodes φ(x) where
 * the unknowns stood inside every monomial. Its solutions are exactly φ⁻¹ of the base system's solutions, so a
 * solver must find the same number of them, at the places `fromBase` says. Random data of φ are parameters (so the
 * compiled code of one structure is shared by every seed), listed in `parameterNames` with `parameterValues`.
 */
export interface CoordinateChange {
  /** Short label for tables and test names, e.g. "scaled ×40". */
  readonly label: string;
  readonly parameterNames: readonly string[];
  /** Packed complex values of parameterNames, in order. */
  readonly parameterValues: Float64Array;
  /** The nodes φ(x) standing for the unknowns x (one per unknown), given nodes for parameterNames in order. */
  coordinates(unknowns: readonly ExprNode[], parameters: readonly ExprNode[]): ExprNode[];
  /** Maps a solution of the base system (packed complex) to the corresponding solution of the variant: φ⁻¹. */
  fromBase(point: Float64Array): Float64Array;
}

/** The identity change: the base system itself. */
export function unchanged(): CoordinateChange {
  return { label: 'base', parameterNames: [], parameterValues: new Float64Array(0), coordinates: (x) => [...x], fromBase: (p) => Float64Array.from(p) };
}

/**
 * Unknowns scaled by σ > 0: x_j becomes x_j/σ (the node (1/σ)·x_j) inside every monomial, so every solution is σ
 * times the base one. fromBase multiplies by σ (exact up to the rounding of 1/σ, relative ≤ 2⁻⁵³).
 */
export function scaledUnknowns(sigma: number): CoordinateChange {
  if (!(sigma > 0) || !Number.isFinite(sigma)) throw new RangeError(`scale factor must be a positive finite number, got ${sigma}`);
  const inverse = constant(1 / sigma);
  return {
    label: `scaled ×${sigma}`,
    parameterNames: [],
    parameterValues: new Float64Array(0),
    coordinates: (x) => x.map((xj) => mul(inverse, xj)),
    fromBase: (p) => p.map((v) => sigma * v),
  };
}

/**
 * A random complex linear change x ↦ A·x (A n×n with independent Gaussian complex entries drawn row by row from
 * createRandom(seed), as parameters a<i>_<j>; singular with probability 0). fromBase solves A·y = x by LU with partial
 * pivoting (relative error ≲ κ(A)·2⁻⁵³; κ(A) is returned as `condition` for tolerances).
 */
export function linearChange(n: number, seed: number): CoordinateChange & { readonly matrix: Float64Array; readonly condition: number } {
  const random = createRandom(seed);
  const matrix = new Float64Array(2 * n * n);
  for (let k = 0; k < n * n; k++) random.gaussianComplex(matrix, 2 * k);
  const lu = createDenseLU(n);
  const condition = lu.factor(Float64Array.from(matrix));
  if (!Number.isFinite(condition)) throw new Error(`linear change with seed ${seed} is singular (draw another seed)`);
  return {
    label: 'linear change',
    parameterNames: Array.from({ length: n * n }, (_, k) => `a${Math.floor(k / n) + 1}_${(k % n) + 1}`),
    parameterValues: Float64Array.from(matrix),
    matrix,
    condition,
    coordinates: (x, a) => Array.from({ length: n }, (_, i) => dot(a.slice(i * n, (i + 1) * n), x)),
    fromBase: (p) => {
      const out = new Float64Array(2 * n);
      lu.solve(p, out);
      return out;
    },
  };
}
