import { type ExprNode, exprBuilders as ops, type PolynomialSystem } from '../../../src/engine/index.ts';
import { CONIC_LETTERS, parameterNames, tangencyUnknownNames } from './conic-names.ts';
import { conicAt, conicMatrix, matVec } from './conic-expr.ts';
import { chartCount, chartIndex, contactIndex, type TangencyShape } from './tangency-layout.ts';

/**
 * The tangency-point formulation as an expression graph (for the compiler and for certification), with the chart
 * constants (packed complex, layout of tangency-layout.ts) baked in as constants. Per given conic A and its point
 * P = o + s·v + r·w: Pᵀ A P = 0, Pᵀ U P = 0, det[A P, U P, m] = 0. Degrees: chart 1, points 1, tangency 2, 3, 3.
 */
export function tangencySystem(shape: TangencyShape, chart: Float64Array): PolynomialSystem {
  if (chart.length !== 2 * chartCount(shape)) throw new RangeError(`tangency system: chart has ${chart.length} reals, expected ${2 * chartCount(shape)}`);
  const unknownNames = tangencyUnknownNames(shape), parameterList = parameterNames(shape);
  const x = unknownNames.map((name, i) => ops.unknown(name, i));
  const par = (name: string): ExprNode => ops.param(name, parameterList.indexOf(name));
  const c = (k: number): ExprNode => ops.constant(chart[2 * k]!, chart[2 * k + 1]!);
  const u = x.slice(0, 6);
  const U = conicMatrix(ops, u);
  const equations: ExprNode[] = [ops.sub(ops.dot([0, 1, 2, 3, 4, 5].map(c), u), 1)];
  for (let j = 1; j <= shape.points; j++) equations.push(conicAt(ops, u, [par(`x${j}`), par(`y${j}`), ops.constant(1)]));
  for (let i = 0; i < shape.conics; i++) {
    const base = chartIndex(i), s = x[contactIndex(i)]!, r = x[contactIndex(i) + 1]!;
    const P = [0, 1, 2].map((j) => ops.add(c(base + j), ops.mul(s, c(base + 3 + j)), ops.mul(r, c(base + 6 + j))));
    const m = [0, 1, 2].map((j) => c(base + 9 + j));
    const a = CONIC_LETTERS.map((l) => par(`${l}${i + 1}`));
    const AP = matVec(ops, conicMatrix(ops, a), P), UP = matVec(ops, U, P);
    equations.push(conicAt(ops, a, P), conicAt(ops, u, P), ops.det([AP, UP, m]));
  }
  return { unknowns: unknownNames, parameters: parameterList, equations };
}
