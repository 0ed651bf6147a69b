import { exprBuilders, type ExprNode } from '../../../src/engine/index.ts';
import type { CoefficientSource } from './coefficient-source.ts';
import { densePolynomial } from './dense-polynomial.ts';

const { mul, add } = exprBuilders;

/** A family of square systems with random coefficients whose number of isolated nonsingular solutions is known. */
export interface StressFamily {
  /** Short label for tables and test names, e.g. "dense (6,6,6)". */
  readonly label: string;
  /** Number of unknowns (= number of equations). */
  readonly unknowns: number;
  /** Degrees of the equations (the total-degree start system tracks their product). */
  readonly degrees: readonly number[];
  /** Isolated solutions, all finite and nonsingular, for generic coefficients. */
  readonly expected: number;
  /** Why `expected` holds: the published theorem or the argument, with its source. */
  readonly reason: string;
  /** The equations in the given coordinate nodes, drawing every coefficient from the source in a fixed order. */
  equations(coordinates: readonly ExprNode[], source: CoefficientSource): ExprNode[];
}

const product = (values: readonly number[]): number => values.reduce((p, v) => p * v, 1);
const tuple = (degrees: readonly number[]): string =>
  degrees.every((d) => d === degrees[0]) && degrees.length > 5 ? `(${degrees[0]}^${degrees.length})` : `(${degrees.join(',')})`;

/**
 * n dense equations, f_i having every monomial of degree ≤ d_i with a Gaussian complex coefficient. Expected ∏ d_i:
 * for generic coefficients every solution is finite and nonsingular and there are exactly ∏ d_i of them
 * (Bézout's theorem; Cox, Little, O'Shea, Using Algebraic Geometry, 2nd ed., Springer 2005, ch. 3).
 */
export function denseFamily(degrees: readonly number[]): StressFamily {
  return {
    label: `dense ${tuple(degrees)}`,
    unknowns: degrees.length,
    degrees: [...degrees],
    expected: product(degrees),
    reason: "Bézout's theorem for generic dense systems (Cox, Little, O'Shea, Using Algebraic Geometry, 2nd ed. 2005, ch. 3)",
    equations: (x, source) => degrees.map((d) => densePolynomial(x, d, source)),
  };
}

/**
 * f_i = ℓ·g_i with ℓ a random affine linear form and g_i dense random of degree d_i − 1 (every d_i ≥ 2). The zero set
 * is the hyperplane ℓ = 0 together with V(g_1, …, g_n): ∏(d_i − 1) points by Bézout's theorem (Cox–Little–O'Shea
 * 2005, ch. 3), generically off the hyperplane. At such a point p, g(p) = 0 gives ∂f/∂x(p) = ℓ(p)·∂g/∂x(p), which is
 * invertible, so these are exactly the isolated solutions and all are nonsingular; the other ∏d_i − ∏(d_i − 1)
 * total-degree paths end on the hyperplane (positive-dimensional excess) or at infinity.
 */
export function hyperplaneExcessFamily(degrees: readonly number[]): StressFamily {
  if (degrees.some((d) => !Number.isInteger(d) || d < 2)) throw new RangeError(`hyperplane excess needs every degree ≥ 2, got ${degrees.join(',')}`);
  return {
    label: `hyperplane × dense ${tuple(degrees.map((d) => d - 1))}`,
    unknowns: degrees.length,
    degrees: [...degrees],
    expected: product(degrees.map((d) => d - 1)),
    reason: "ℓ·g_i vanishes on the hyperplane ℓ = 0; the isolated solutions are the ∏(d_i − 1) nonsingular zeros of the dense g (Bézout's theorem, Cox–Little–O'Shea 2005, ch. 3)",
    equations: (x, source) => {
      const l = densePolynomial(x, 1, source);
      return degrees.map((d) => mul(l, densePolynomial(x, d - 1, source)));
    },
  };
}

/**
 * Three equations f_i = q₁·a_i + q₂·b_i in three unknowns, q₁, q₂ dense random quadrics and a_i, b_i dense random of
 * degree e ≥ 1 (so deg f_i = e + 2). Every f_i vanishes on the space curve q₁ = q₂ = 0. The isolated solutions are
 * the points off that curve where (q₁, q₂) ≠ 0 lies in the kernel of the 3×2 matrix [a_i b_i]: with [u:v] ∈ P¹ they
 * are the solutions in P³×P¹ of u·q₂ − v·q₁ = 0 (bidegree (2,1)) and a_i·u + b_i·v = 0 (bidegree (e,1)), generic
 * members of base-point-free systems, so by the multihomogeneous Bézout count (coefficient of H³h in
 * (2H + h)(eH + h)³) there are e³ + 6e² of them (our own derivation; checked independently by Gröbner bases in
 * Singular, over Q for e = 1, 2 and over F_32003 for e = 1, 2, 3: test/engine/stress/isolated-counts.sing).
 */
export function curveExcessFamily(e: number): StressFamily {
  if (!Number.isInteger(e) || e < 1) throw new RangeError(`curve excess needs a degree e ≥ 1, got ${e}`);
  return {
    label: `quartic curve excess, degree ${e + 2}`,
    unknowns: 3,
    degrees: [e + 2, e + 2, e + 2],
    expected: e ** 3 + 6 * e ** 2,
    reason: 'q₁a_i + q₂b_i vanishes on the curve q₁ = q₂ = 0; isolated solutions e³ + 6e² (bihomogeneous count in P³×P¹, our derivation, checked by Gröbner bases in Singular)',
    equations: (x, source) => {
      const q1 = densePolynomial(x, 2, source), q2 = densePolynomial(x, 2, source);
      return [0, 1, 2].map(() => add(mul(q1, densePolynomial(x, e, source)), mul(q2, densePolynomial(x, e, source))));
    },
  };
}
