/**
 * The expression graph: polynomial expressions over the complex numbers in unknowns and parameters.
 * Nodes are immutable plain objects; a node may be shared by several parents (the graph is a DAG).
 * Constants are complex (re, im); powers have a non-negative integer exponent, so every graph is a polynomial.
 */
export type ExprNode =
  | { readonly kind: 'const'; readonly re: number; readonly im: number }
  | { readonly kind: 'unknown'; readonly index: number; readonly name: string }
  | { readonly kind: 'param'; readonly index: number; readonly name: string }
  | { readonly kind: 'add'; readonly terms: readonly ExprNode[] }
  | { readonly kind: 'mul'; readonly factors: readonly ExprNode[] }
  | { readonly kind: 'neg'; readonly arg: ExprNode }
  | { readonly kind: 'pow'; readonly base: ExprNode; readonly exponent: number };

/** The kinds of node, for strategy tables keyed by kind. */
export type ExprKind = ExprNode['kind'];

/**
 * A square or non-square polynomial system as given by a problem definition: named unknowns and parameters
 * (indices into the packed complex vectors x and p), equations as graphs, optional variable groups
 * (a partition of the unknown indices, for multihomogeneous Bézout bounds and start systems).
 */
export interface PolynomialSystem {
  readonly unknowns: readonly string[];
  readonly parameters: readonly string[];
  readonly equations: readonly ExprNode[];
  readonly groups?: readonly (readonly number[])[];
}
