import type { ExprNode } from '../expr/node.ts';
import { add, mul, sub, unknown } from '../expr/build.ts';

/**
 * A start system in multiprojective coordinates X = (x_0 … x_{n−1}, h_0 … h_{G−1}) (h_g homogenises group g):
 * n equations G_i (without the chart equations) and its `count` solutions, packed complex, each of length 2(n + G),
 * stored one after another in `starts`, in the path order that every run uses.
 */
export interface StartSystem {
  readonly equations: ExprNode[];
  readonly count: number;
  readonly starts: Float64Array;
}

/** Hands out parameters of the homotopy for random data: each call records a value and returns its parameter node. */
export interface ParameterBank {
  add(re: number, im: number): ExprNode;
}

/** The chart equation Σ_k c_k·X_{coords[k]} − 1, with the packed complex coefficients c taken into the bank as parameters. */
export function chartEquation(coords: readonly number[], coefficients: Float64Array, bank: ParameterBank): ExprNode {
  const terms = coords.map((j, k) => mul(bank.add(coefficients[2 * k]!, coefficients[2 * k + 1]!), unknown(`X${j}`, j)));
  return sub(add(...terms), 1);
}
