import type { ExprNode, exprBuilders as ExprOps } from '../../../src/engine/index.ts';

type Ops = typeof ExprOps;

/** Σ coefficients[m]·Π variables[i]^exponents[m][i] as one expression (degree = the largest exponent sum). */
export function polynomial(ops: Ops, coefficients: readonly ExprNode[], exponents: readonly (readonly number[])[], variables: readonly ExprNode[]): ExprNode {
  return ops.add(...exponents.map((e, m) => ops.mul(coefficients[m]!, ...e.flatMap((power, i) => (power === 0 ? [] : [ops.pow(variables[i]!, power)])))));
}

/**
 * The Hessian determinant of the homogenisation F(x, y, z) of a plane curve Σ c·xⁱyʲ of degree d, evaluated
 * on the affine chart z = 1: det ∂²F/∂u∂v (u, v ∈ {x, y, z}). Its degree is 3(d − 2); its zeros on the curve
 * are the flexes (Hesse). Built symbolically, so exact for every coefficient value.
 */
export function hessianOnChart(ops: Ops, coefficients: readonly ExprNode[], exponents: readonly (readonly number[])[], degree: number, x: ExprNode, y: ExprNode): ExprNode {
  const homogeneous = exponents.map(([i, j]) => [i!, j!, degree - i! - j!]);
  const second = (u: number, v: number): ExprNode => {
    const terms: ExprNode[] = [];
    homogeneous.forEach((e, m) => {
      const f = [...e];
      let factor = f[u]!;
      f[u]! -= 1;
      factor *= f[v]!;
      f[v]! -= 1;
      if (factor === 0) return;
      terms.push(ops.mul(factor, coefficients[m]!, ...(f[0]! > 0 ? [ops.pow(x, f[0]!)] : []), ...(f[1]! > 0 ? [ops.pow(y, f[1]!)] : [])));
    });
    return ops.add(...terms);
  };
  return ops.det([0, 1, 2].map((u) => [0, 1, 2].map((v) => second(u, v))));
}
