import type { ExprNode, exprBuilders as ExprOps } from '../../../src/engine/index.ts';
import type { ExprPolynomial } from './univariate.ts';

type Ops = typeof ExprOps;

/**
 * The affine chart of the lines of projective n-space used to count lines on hypersurfaces: the line through
 * p = frame·(1, 0, u₀, …, u_{n−2}) and q = frame·(0, 1, u_{n−1}, …, u_{2n−3}), for an invertible real (n+1)×(n+1)
 * `frame` (a recorded change of coordinates). Returns, per homogeneous coordinate i, the polynomial p_i + s·q_i in
 * the pencil parameter s, its two coefficients affine in the 2(n − 1) unknowns (exact zeros of the frame are skipped).
 */
export function chartLineExpr(ops: Ops, frame: readonly (readonly number[])[], unknowns: readonly ExprNode[]): ExprPolynomial[] {
  const n = frame.length - 1;
  if (unknowns.length !== 2 * (n - 1)) throw new RangeError(`line chart of P^${n}: expected ${2 * (n - 1)} unknowns, got ${unknowns.length}`);
  const affine = (row: readonly number[], lead: number, offset: number): ExprNode => {
    const terms: ExprNode[] = [];
    if (row[lead] !== 0) terms.push(ops.constant(row[lead]!));
    for (let j = 2; j <= n; j++) if (row[j] !== 0) terms.push(ops.mul(row[j]!, unknowns[offset + j - 2]!));
    return terms.length === 0 ? ops.constant(0) : ops.add(...terms);
  };
  return frame.map((row) => [affine(row, 0, 0), affine(row, 1, n - 1)]);
}

/** The same line numerically: the points p and q (packed complex, n + 1 entries each) for chart values (packed complex). */
export function chartLinePoints(frame: readonly (readonly number[])[], values: Float64Array): { readonly p: Float64Array; readonly q: Float64Array } {
  const n = frame.length - 1;
  const p = new Float64Array(2 * (n + 1)), q = new Float64Array(2 * (n + 1));
  frame.forEach((row, i) => {
    let pr = row[0]!, pi = 0, qr = row[1]!, qi = 0;
    for (let j = 2; j <= n; j++) {
      pr += row[j]! * values[2 * (j - 2)]!;
      pi += row[j]! * values[2 * (j - 2) + 1]!;
      qr += row[j]! * values[2 * (n - 1 + j - 2)]!;
      qi += row[j]! * values[2 * (n - 1 + j - 2) + 1]!;
    }
    p[2 * i] = pr; p[2 * i + 1] = pi; q[2 * i] = qr; q[2 * i + 1] = qi;
  });
  return { p, q };
}
