import type { Homotopy } from '../../../src/engine/homotopy.ts';
import { createArrowheadSolver } from '../../../src/engine/linalg/arrowhead-solver.ts';
import { gammaArc } from '../../../src/engine/parameter/gamma-arc.ts';
import { coefficientGradient, conicTimesPoint, cross3, dot3 } from './conic-kernels.ts';
import { chartCount, parameterCount, pointOf, tangencyArrowhead, unknownCount, type TangencyShape } from './tangency-layout.ts';

/** Arguments of the worker-loadable homotopy: the shape, chart constants and one parameter leg (all packed complex). */
export interface TangencyHomotopyArgs extends TangencyShape {
  readonly chart: ArrayLike<number>;
  readonly from: ArrayLike<number>;
  readonly to: ArrayLike<number>;
  readonly gamma: readonly [number, number];
}

/**
 * Hand-written evaluator of the tangency-point formulation along the parameter arc p(τ(t)) of the gamma trick
 * (see tangency-layout.ts for the layout). Why this formulation and not the 5-unknown sextic one: its degrees are
 * ≤ 3 and the given conics enter linearly, and its paths stay away from the double-line conics, where the sextic
 * form's Jacobian degenerates and double precision lost 7–15 of 3264 solutions per instance in our measurements;
 * the Jacobian is an arrowhead (u shared, one 3×2 block per tangency point), so a linear solve costs a 6×6 LU.
 * It evaluates the same polynomials as tangency-system.ts (tests compare them). Allocates nothing per call.
 */
export function createHomotopy(args: TangencyHomotopyArgs): Homotopy {
  const shape: TangencyShape = { points: args.points, conics: args.conics };
  const n = unknownCount(shape), np = parameterCount(shape), k = args.conics, pts = args.points;
  const need = (name: string, v: ArrayLike<number>, len: number): Float64Array => {
    if (v.length !== 2 * len) throw new RangeError(`tangency homotopy: ${name} has ${v.length} reals, expected ${2 * len}`);
    return Float64Array.from(v);
  };
  const chart = need('chart', args.chart, chartCount(shape));
  const from = need('from', args.from, np);
  const delta = need('to', args.to, np);
  for (let i = 0; i < 2 * np; i++) delta[i] = delta[i]! - from[i]!;
  const [gRe, gIm] = args.gamma;
  const par = new Float64Array(2 * np), dpar = new Float64Array(2 * np), arc = new Float64Array(4);
  const P = new Float64Array(6), AP = new Float64Array(6), UP = new Float64Array(6), dAP = new Float64Array(6);
  const g = new Float64Array(6), hv = new Float64Array(6), t1 = new Float64Array(6), grad = new Float64Array(12);
  const layout = tangencyArrowhead(shape);

  function parametersAt(tRe: number, tIm: number): void {
    gammaArc(tRe, tIm, gRe, gIm, arc);
    const sr = arc[0]!, si = arc[1]!, dr = arc[2]!, di = arc[3]!;
    for (let i = 0; i < 2 * np; i += 2) {
      const xr = delta[i]!, xi = delta[i + 1]!;
      par[i] = from[i]! + sr * xr - si * xi;
      par[i + 1] = from[i + 1]! + sr * xi + si * xr;
      dpar[i] = dr * xr - di * xi;
      dpar[i + 1] = dr * xi + di * xr;
    }
  }

  function run(x: Float64Array, tRe: number, tIm: number, h: Float64Array, jac: Float64Array | null, ht: Float64Array | null): void {
    parametersAt(tRe, tIm);
    if (jac !== null) jac.fill(0);
    // Row 0: the chart ℓ·u = 1.
    let cr = -1, ci = 0;
    for (let j = 0; j < 6; j++) {
      const lr = chart[2 * j]!, li = chart[2 * j + 1]!, ur = x[2 * j]!, ui = x[2 * j + 1]!;
      cr += lr * ur - li * ui;
      ci += lr * ui + li * ur;
      if (jac !== null) { jac[2 * j] = lr; jac[2 * j + 1] = li; }
    }
    h[0] = cr; h[1] = ci;
    if (ht !== null) { ht[0] = 0; ht[1] = 0; }
    // Point rows: Qᵀ U Q = 0 with Q = (x, y, 1) from the parameters.
    for (let j = 0; j < pts; j++) {
      const row = 1 + j;
      P[0] = par[4 * j]!; P[1] = par[4 * j + 1]!; P[2] = par[4 * j + 2]!; P[3] = par[4 * j + 3]!; P[4] = 1; P[5] = 0;
      conicTimesPoint(x, 0, P, 0, UP, 0);
      dot3(P, 0, UP, 0, h, 2 * row);
      if (jac !== null) {
        coefficientGradient(P, 0, P, 0, grad, 0);
        for (let c = 0; c < 12; c++) jac[2 * row * n + c] = grad[c]!;
      }
      if (ht !== null) {
        t1[0] = dpar[4 * j]!; t1[1] = dpar[4 * j + 1]!; t1[2] = dpar[4 * j + 2]!; t1[3] = dpar[4 * j + 3]!; t1[4] = 0; t1[5] = 0;
        dot3(t1, 0, UP, 0, ht, 2 * row, 2);
      }
    }
    // Tangency blocks.
    for (let i = 0; i < k; i++) {
      const co = 2 * (6 + 12 * i), po = 2 * (2 * pts + 6 * i), row = 1 + pts + 3 * i;
      pointOf(chart, i, x, P, 0);
      conicTimesPoint(par, po, P, 0, AP, 0);
      conicTimesPoint(x, 0, P, 0, UP, 0);
      cross3(chart, co + 18, AP, 0, g, 0); // g = m × AP
      cross3(UP, 0, chart, co + 18, hv, 0); // hv = UP × m
      const r1 = 2 * row, r2 = 2 * (row + 1), r3 = 2 * (row + 2);
      dot3(P, 0, AP, 0, h, r1);
      dot3(P, 0, UP, 0, h, r2);
      dot3(AP, 0, hv, 0, h, r3);
      if (jac !== null) {
        const cs = 2 * (6 + 2 * i);
        // ∂E3/∂P = A·hv + U·g
        conicTimesPoint(par, po, hv, 0, t1, 0);
        conicTimesPoint(x, 0, g, 0, dAP, 0);
        for (let c = 0; c < 6; c++) t1[c] = t1[c]! + dAP[c]!;
        for (let d = 0; d < 2; d++) {
          const dir = co + 6 + 6 * d; // v, then w
          dot3(AP, 0, chart, dir, jac, r1 * n + cs + 2 * d, 2);
          dot3(UP, 0, chart, dir, jac, r2 * n + cs + 2 * d, 2);
          dot3(t1, 0, chart, dir, jac, r3 * n + cs + 2 * d);
        }
        coefficientGradient(P, 0, P, 0, grad, 0);
        for (let c = 0; c < 12; c++) jac[r2 * n + c] = grad[c]!;
        coefficientGradient(g, 0, P, 0, grad, 0);
        for (let c = 0; c < 12; c++) jac[r3 * n + c] = grad[c]!;
      }
      if (ht !== null) {
        conicTimesPoint(dpar, po, P, 0, dAP, 0);
        dot3(P, 0, dAP, 0, ht, r1);
        ht[r2] = 0; ht[r2 + 1] = 0;
        dot3(dAP, 0, hv, 0, ht, r3);
      }
    }
  }

  return {
    n,
    evaluate(x, tRe, tIm, h, jac, ht) { run(x, tRe, tIm, h, jac, ht); },
    evaluateValue(x, tRe, tIm, h) { run(x, tRe, tIm, h, null, null); },
    createSolver: () => createArrowheadSolver(layout),
  };
}
