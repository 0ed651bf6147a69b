import { gammaArc, type Homotopy } from '../../../src/engine/index.ts';
import { createTangencySolver } from './tangency-pair-blocks.ts';
import { coefficientGradient, conicTimesPoint, dot3 } from './conic-kernels.ts';
import { chartCount, chartIndex, contactIndex, givenConicIndex, parameterCount, tangencyArrowhead, tangencyRow, unknownCount, type TangencyShape } from './tangency-layout.ts';

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
 * form's Jacobian degenerates: a parameter homotopy on it lost 7–15 of 3264 solutions per instance in the project's
 * first measurements, and the naive total-degree run on it then found 3255 of 3264 (today's figures: naive-run-figures.ts), while this form
 * found 3264 of 3264 on every instance measured (20 random, the real demo);
 * the Jacobian is an arrowhead (u shared, one 3×2 block per tangency point), so a linear solve costs a 6×6 LU.
 * The blocks are straight-line complex arithmetic: 0.8 µs per evaluation against 2.3 µs with small kernel calls
 * (measured, 16 unknowns). It evaluates the same polynomials as tangency-system.ts (tests compare them, and
 * central differences check the derivatives). Allocates nothing per call.
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
  const P = new Float64Array(6), UP = new Float64Array(6), t1 = new Float64Array(6), grad = new Float64Array(12);
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
    // Tangency blocks, in straight-line complex arithmetic (…r, …i pairs) so that everything stays in registers.
    const uar = x[0]!, uai = x[1]!, ubr = 0.5 * x[2]!, ubi = 0.5 * x[3]!, ucr = x[4]!, uci = x[5]!;
    const udr = 0.5 * x[6]!, udi = 0.5 * x[7]!, uer = 0.5 * x[8]!, uei = 0.5 * x[9]!, ufr = x[10]!, ufi = x[11]!;
    for (let i = 0; i < k; i++) {
      const co = 2 * chartIndex(i), po = 2 * givenConicIndex(shape, i), so = 2 * contactIndex(i), cs = so, row = tangencyRow(shape, i);
      const r1 = 2 * row, r2 = 2 * (row + 1), r3 = 2 * (row + 2);
      const sr = x[so]!, si = x[so + 1]!;
      const rr = x[so + 2]!, ri = x[so + 2 + 1]!;
      const o0r = chart[co + 0]!, o0i = chart[co + 0 + 1]!;
      const o1r = chart[co + 2]!, o1i = chart[co + 2 + 1]!;
      const o2r = chart[co + 4]!, o2i = chart[co + 4 + 1]!;
      const v0r = chart[co + 6]!, v0i = chart[co + 6 + 1]!;
      const v1r = chart[co + 8]!, v1i = chart[co + 8 + 1]!;
      const v2r = chart[co + 10]!, v2i = chart[co + 10 + 1]!;
      const w0r = chart[co + 12]!, w0i = chart[co + 12 + 1]!;
      const w1r = chart[co + 14]!, w1i = chart[co + 14 + 1]!;
      const w2r = chart[co + 16]!, w2i = chart[co + 16 + 1]!;
      const m0r = chart[co + 18]!, m0i = chart[co + 18 + 1]!;
      const m1r = chart[co + 20]!, m1i = chart[co + 20 + 1]!;
      const m2r = chart[co + 22]!, m2i = chart[co + 22 + 1]!;
      const p0r = o0r + sr * v0r - si * v0i + rr * w0r - ri * w0i, p0i = o0i + sr * v0i + si * v0r + rr * w0i + ri * w0r;
      const p1r = o1r + sr * v1r - si * v1i + rr * w1r - ri * w1i, p1i = o1i + sr * v1i + si * v1r + rr * w1i + ri * w1r;
      const p2r = o2r + sr * v2r - si * v2i + rr * w2r - ri * w2i, p2i = o2i + sr * v2i + si * v2r + rr * w2i + ri * w2r;
      const aar = par[po]!, aai = par[po + 1]!;
      const abr = 0.5 * par[po + 2]!, abi = 0.5 * par[po + 2 + 1]!;
      const acr = par[po + 4]!, aci = par[po + 4 + 1]!;
      const adr = 0.5 * par[po + 6]!, adi = 0.5 * par[po + 6 + 1]!;
      const aer = 0.5 * par[po + 8]!, aei = 0.5 * par[po + 8 + 1]!;
      const afr = par[po + 10]!, afi = par[po + 10 + 1]!;
      const q0r = aar * p0r - aai * p0i + abr * p1r - abi * p1i + adr * p2r - adi * p2i, q0i = aar * p0i + aai * p0r + abr * p1i + abi * p1r + adr * p2i + adi * p2r;
      const q1r = abr * p0r - abi * p0i + acr * p1r - aci * p1i + aer * p2r - aei * p2i, q1i = abr * p0i + abi * p0r + acr * p1i + aci * p1r + aer * p2i + aei * p2r;
      const q2r = adr * p0r - adi * p0i + aer * p1r - aei * p1i + afr * p2r - afi * p2i, q2i = adr * p0i + adi * p0r + aer * p1i + aei * p1r + afr * p2i + afi * p2r;
      const y0r = uar * p0r - uai * p0i + ubr * p1r - ubi * p1i + udr * p2r - udi * p2i, y0i = uar * p0i + uai * p0r + ubr * p1i + ubi * p1r + udr * p2i + udi * p2r;
      const y1r = ubr * p0r - ubi * p0i + ucr * p1r - uci * p1i + uer * p2r - uei * p2i, y1i = ubr * p0i + ubi * p0r + ucr * p1i + uci * p1r + uer * p2i + uei * p2r;
      const y2r = udr * p0r - udi * p0i + uer * p1r - uei * p1i + ufr * p2r - ufi * p2i, y2i = udr * p0i + udi * p0r + uer * p1i + uei * p1r + ufr * p2i + ufi * p2r;
      const g0r = m1r * q2r - m1i * q2i - (m2r * q1r - m2i * q1i), g0i = m1r * q2i + m1i * q2r - (m2r * q1i + m2i * q1r);
      const g1r = m2r * q0r - m2i * q0i - (m0r * q2r - m0i * q2i), g1i = m2r * q0i + m2i * q0r - (m0r * q2i + m0i * q2r);
      const g2r = m0r * q1r - m0i * q1i - (m1r * q0r - m1i * q0i), g2i = m0r * q1i + m0i * q1r - (m1r * q0i + m1i * q0r);
      const hv0r = y1r * m2r - y1i * m2i - (y2r * m1r - y2i * m1i), hv0i = y1r * m2i + y1i * m2r - (y2r * m1i + y2i * m1r);
      const hv1r = y2r * m0r - y2i * m0i - (y0r * m2r - y0i * m2i), hv1i = y2r * m0i + y2i * m0r - (y0r * m2i + y0i * m2r);
      const hv2r = y0r * m1r - y0i * m1i - (y1r * m0r - y1i * m0i), hv2i = y0r * m1i + y0i * m1r - (y1r * m0i + y1i * m0r);
      h[r1] = p0r * q0r - p0i * q0i + p1r * q1r - p1i * q1i + p2r * q2r - p2i * q2i; h[r1 + 1] = p0r * q0i + p0i * q0r + p1r * q1i + p1i * q1r + p2r * q2i + p2i * q2r;
      h[r2] = p0r * y0r - p0i * y0i + p1r * y1r - p1i * y1i + p2r * y2r - p2i * y2i; h[r2 + 1] = p0r * y0i + p0i * y0r + p1r * y1i + p1i * y1r + p2r * y2i + p2i * y2r;
      h[r3] = q0r * hv0r - q0i * hv0i + q1r * hv1r - q1i * hv1i + q2r * hv2r - q2i * hv2i; h[r3 + 1] = q0r * hv0i + q0i * hv0r + q1r * hv1i + q1i * hv1r + q2r * hv2i + q2i * hv2r;
      if (jac !== null) {
      const ah0r = aar * hv0r - aai * hv0i + abr * hv1r - abi * hv1i + adr * hv2r - adi * hv2i, ah0i = aar * hv0i + aai * hv0r + abr * hv1i + abi * hv1r + adr * hv2i + adi * hv2r;
      const ah1r = abr * hv0r - abi * hv0i + acr * hv1r - aci * hv1i + aer * hv2r - aei * hv2i, ah1i = abr * hv0i + abi * hv0r + acr * hv1i + aci * hv1r + aer * hv2i + aei * hv2r;
      const ah2r = adr * hv0r - adi * hv0i + aer * hv1r - aei * hv1i + afr * hv2r - afi * hv2i, ah2i = adr * hv0i + adi * hv0r + aer * hv1i + aei * hv1r + afr * hv2i + afi * hv2r;
      const ug0r = uar * g0r - uai * g0i + ubr * g1r - ubi * g1i + udr * g2r - udi * g2i, ug0i = uar * g0i + uai * g0r + ubr * g1i + ubi * g1r + udr * g2i + udi * g2r;
      const ug1r = ubr * g0r - ubi * g0i + ucr * g1r - uci * g1i + uer * g2r - uei * g2i, ug1i = ubr * g0i + ubi * g0r + ucr * g1i + uci * g1r + uer * g2i + uei * g2r;
      const ug2r = udr * g0r - udi * g0i + uer * g1r - uei * g1i + ufr * g2r - ufi * g2i, ug2i = udr * g0i + udi * g0r + uer * g1i + uei * g1r + ufr * g2i + ufi * g2r;
      const t0r = ah0r + ug0r, t0i = ah0i + ug0i;
      const t1r = ah1r + ug1r, t1i = ah1i + ug1i;
      const t2r = ah2r + ug2r, t2i = ah2i + ug2i;
      jac[r1 * n + cs + 0] = 2 * (q0r * v0r - q0i * v0i + q1r * v1r - q1i * v1i + q2r * v2r - q2i * v2i); jac[r1 * n + cs + 0 + 1] = 2 * (q0r * v0i + q0i * v0r + q1r * v1i + q1i * v1r + q2r * v2i + q2i * v2r);
      jac[r2 * n + cs + 0] = 2 * (y0r * v0r - y0i * v0i + y1r * v1r - y1i * v1i + y2r * v2r - y2i * v2i); jac[r2 * n + cs + 0 + 1] = 2 * (y0r * v0i + y0i * v0r + y1r * v1i + y1i * v1r + y2r * v2i + y2i * v2r);
      jac[r3 * n + cs + 0] = t0r * v0r - t0i * v0i + t1r * v1r - t1i * v1i + t2r * v2r - t2i * v2i; jac[r3 * n + cs + 0 + 1] = t0r * v0i + t0i * v0r + t1r * v1i + t1i * v1r + t2r * v2i + t2i * v2r;
      jac[r1 * n + cs + 2] = 2 * (q0r * w0r - q0i * w0i + q1r * w1r - q1i * w1i + q2r * w2r - q2i * w2i); jac[r1 * n + cs + 2 + 1] = 2 * (q0r * w0i + q0i * w0r + q1r * w1i + q1i * w1r + q2r * w2i + q2i * w2r);
      jac[r2 * n + cs + 2] = 2 * (y0r * w0r - y0i * w0i + y1r * w1r - y1i * w1i + y2r * w2r - y2i * w2i); jac[r2 * n + cs + 2 + 1] = 2 * (y0r * w0i + y0i * w0r + y1r * w1i + y1i * w1r + y2r * w2i + y2i * w2r);
      jac[r3 * n + cs + 2] = t0r * w0r - t0i * w0i + t1r * w1r - t1i * w1i + t2r * w2r - t2i * w2i; jac[r3 * n + cs + 2 + 1] = t0r * w0i + t0i * w0r + t1r * w1i + t1i * w1r + t2r * w2i + t2i * w2r;
      jac[r2 * n + 0] = p0r * p0r - p0i * p0i; jac[r2 * n + 0 + 1] = p0r * p0i + p0i * p0r;
      jac[r2 * n + 2] = 0.5 * (p0r * p1r - p0i * p1i + p1r * p0r - p1i * p0i); jac[r2 * n + 2 + 1] = 0.5 * (p0r * p1i + p0i * p1r + p1r * p0i + p1i * p0r);
      jac[r2 * n + 4] = p1r * p1r - p1i * p1i; jac[r2 * n + 4 + 1] = p1r * p1i + p1i * p1r;
      jac[r2 * n + 6] = 0.5 * (p0r * p2r - p0i * p2i + p2r * p0r - p2i * p0i); jac[r2 * n + 6 + 1] = 0.5 * (p0r * p2i + p0i * p2r + p2r * p0i + p2i * p0r);
      jac[r2 * n + 8] = 0.5 * (p1r * p2r - p1i * p2i + p2r * p1r - p2i * p1i); jac[r2 * n + 8 + 1] = 0.5 * (p1r * p2i + p1i * p2r + p2r * p1i + p2i * p1r);
      jac[r2 * n + 10] = p2r * p2r - p2i * p2i; jac[r2 * n + 10 + 1] = p2r * p2i + p2i * p2r;
      jac[r3 * n + 0] = g0r * p0r - g0i * p0i; jac[r3 * n + 0 + 1] = g0r * p0i + g0i * p0r;
      jac[r3 * n + 2] = 0.5 * (g0r * p1r - g0i * p1i + g1r * p0r - g1i * p0i); jac[r3 * n + 2 + 1] = 0.5 * (g0r * p1i + g0i * p1r + g1r * p0i + g1i * p0r);
      jac[r3 * n + 4] = g1r * p1r - g1i * p1i; jac[r3 * n + 4 + 1] = g1r * p1i + g1i * p1r;
      jac[r3 * n + 6] = 0.5 * (g0r * p2r - g0i * p2i + g2r * p0r - g2i * p0i); jac[r3 * n + 6 + 1] = 0.5 * (g0r * p2i + g0i * p2r + g2r * p0i + g2i * p0r);
      jac[r3 * n + 8] = 0.5 * (g1r * p2r - g1i * p2i + g2r * p1r - g2i * p1i); jac[r3 * n + 8 + 1] = 0.5 * (g1r * p2i + g1i * p2r + g2r * p1i + g2i * p1r);
      jac[r3 * n + 10] = g2r * p2r - g2i * p2i; jac[r3 * n + 10 + 1] = g2r * p2i + g2i * p2r;
      }
      if (ht !== null) {
      const dar = dpar[po]!, dai = dpar[po + 1]!;
      const dbr = 0.5 * dpar[po + 2]!, dbi = 0.5 * dpar[po + 2 + 1]!;
      const dcr = dpar[po + 4]!, dci = dpar[po + 4 + 1]!;
      const ddr = 0.5 * dpar[po + 6]!, ddi = 0.5 * dpar[po + 6 + 1]!;
      const der = 0.5 * dpar[po + 8]!, dei = 0.5 * dpar[po + 8 + 1]!;
      const dfr = dpar[po + 10]!, dfi = dpar[po + 10 + 1]!;
      const z0r = dar * p0r - dai * p0i + dbr * p1r - dbi * p1i + ddr * p2r - ddi * p2i, z0i = dar * p0i + dai * p0r + dbr * p1i + dbi * p1r + ddr * p2i + ddi * p2r;
      const z1r = dbr * p0r - dbi * p0i + dcr * p1r - dci * p1i + der * p2r - dei * p2i, z1i = dbr * p0i + dbi * p0r + dcr * p1i + dci * p1r + der * p2i + dei * p2r;
      const z2r = ddr * p0r - ddi * p0i + der * p1r - dei * p1i + dfr * p2r - dfi * p2i, z2i = ddr * p0i + ddi * p0r + der * p1i + dei * p1r + dfr * p2i + dfi * p2r;
      ht[r1] = p0r * z0r - p0i * z0i + p1r * z1r - p1i * z1i + p2r * z2r - p2i * z2i; ht[r1 + 1] = p0r * z0i + p0i * z0r + p1r * z1i + p1i * z1r + p2r * z2i + p2i * z2r;
      ht[r2] = 0; ht[r2 + 1] = 0;
      ht[r3] = z0r * hv0r - z0i * hv0i + z1r * hv1r - z1i * hv1i + z2r * hv2r - z2i * hv2i; ht[r3 + 1] = z0r * hv0i + z0i * hv0r + z1r * hv1i + z1i * hv1r + z2r * hv2i + z2i * hv2r;
      }
    }
  }

  return {
    n,
    evaluate(x, tRe, tIm, h, jac, ht) { run(x, tRe, tIm, h, jac, ht); },
    evaluateValue(x, tRe, tIm, h) { run(x, tRe, tIm, h, null, null); },
    createSolver: () => createTangencySolver(layout),
  };
}
