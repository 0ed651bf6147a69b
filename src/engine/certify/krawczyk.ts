import { widenDown, widenUp } from '../interval/outward.ts';
import { mulHi, mulLo, scaleHi, scaleLo } from '../interval/bounds.ts';
import { dotEnclosure, midRadius } from '../interval/dot-bound.ts';
import type { CertifiableSystem } from './compiled-system.ts';

/**
 * Krawczyk's test (Krawczyk, Computing 4, 1969; Rump's form with an approximate inverse Y) on a complex box X
 * with centre m ∈ X: K(X) = m − Y·F(m) + (I − Y·J(X))·(X − m). If K(X) lies in the interior of X, the system
 * has exactly one zero in X (and it lies in K(X)). Every operation is outward rounded, so a pass is a proof; a
 * NaN or an overflow makes the test fail, never pass. The n³ part, Y·J(X), runs in midpoint–radius form with an
 * a-priori rounding bound (dot-bound.ts), which is sound and an order of magnitude cheaper than widening every term. Buffers are made once per size; a test allocates nothing.
 */
export interface KrawczykTester {
  /**
   * Runs the test; K(X) is left in `enclosure` (4n). X is 4n rectangles, m and Y packed complex (2n, 2n²); an
   * enclosure of F(m) (4n) may be given (e.g. from exact evaluation), else it is computed in interval arithmetic.
   */
  test(box: Float64Array, centre: Float64Array, inverse: Float64Array, centreValues?: Float64Array): boolean;
  readonly enclosure: Float64Array;
}

/** Creates the test with its buffers for one compiled system. */
export function createKrawczykTester(system: CertifiableSystem): KrawczykTester {
  const n = system.size;
  const centreBox = new Float64Array(4 * n);
  const fm = new Float64Array(4 * n);
  const fx = new Float64Array(4 * n);
  const jx = new Float64Array(4 * n * n);
  const offset = new Float64Array(4 * n); // X − m
  const enclosure = new Float64Array(4 * n);
  const centres = new Float64Array(2 * n * n); // J(X) as complex midpoints …
  const radii = new Float64Array(2 * n * n); // … and radii of the real and imaginary parts
  const work = new Float64Array(4), product = new Float64Array(4);
  // per column j, the rows k with a structurally non-zero J_kj (CSR by column): Y·J(X) skips the zeros
  const columnStart = new Int32Array(n + 1);
  const rows: number[] = [];
  for (let j = 0; j < n; j++) {
    for (let k = 0; k < n; k++) if (system.jacobianPattern[k * n + j]) rows.push(k);
    columnStart[j + 1] = rows.length;
  }
  const columnRows = Int32Array.from(rows);

  const test = (box: Float64Array, centre: Float64Array, inverse: Float64Array, centreValues?: Float64Array): boolean => {
    for (let j = 0; j < n; j++) {
      const mr = centre[2 * j]!, mi = centre[2 * j + 1]!;
      centreBox[4 * j] = mr; centreBox[4 * j + 1] = mr; centreBox[4 * j + 2] = mi; centreBox[4 * j + 3] = mi;
      offset[4 * j] = widenDown(box[4 * j]! - mr);
      offset[4 * j + 1] = widenUp(box[4 * j + 1]! - mr);
      offset[4 * j + 2] = widenDown(box[4 * j + 2]! - mi);
      offset[4 * j + 3] = widenUp(box[4 * j + 3]! - mi);
    }
    if (centreValues) fm.set(centreValues); else system.intervalValues(centreBox, fm);
    system.intervalJacobian(box, fx, jx);
    for (let e = 0; e < n * n; e++) {
      midRadius(jx[4 * e]!, jx[4 * e + 1]!, work, 0);
      midRadius(jx[4 * e + 2]!, jx[4 * e + 3]!, work, 2);
      centres[2 * e] = work[0]!; radii[2 * e] = work[1]!;
      centres[2 * e + 1] = work[2]!; radii[2 * e + 1] = work[3]!;
    }
    let inside = true;
    for (let i = 0; i < n; i++) {
      // K_i starts at m_i − (Y·F(m))_i
      let kl = centre[2 * i]!, kh = kl, ql = centre[2 * i + 1]!, qh = ql;
      for (let k = 0; k < n; k++) {
        const yr = inverse[2 * (i * n + k)]!, yi = inverse[2 * (i * n + k) + 1]!;
        const o = 4 * k;
        const c0 = fm[o]!, c1 = fm[o + 1]!, d0 = fm[o + 2]!, d1 = fm[o + 3]!;
        kl = widenDown(kl - widenUp(scaleHi(yr, c0, c1) - scaleLo(yi, d0, d1)));
        kh = widenUp(kh - widenDown(scaleLo(yr, c0, c1) - scaleHi(yi, d0, d1)));
        ql = widenDown(ql - widenUp(scaleHi(yr, d0, d1) + scaleHi(yi, c0, c1)));
        qh = widenUp(qh - widenDown(scaleLo(yr, d0, d1) + scaleLo(yi, c0, c1)));
      }
      for (let j = 0; j < n; j++) {
        // M_ij = δ_ij − Σ_k Y_ik · J_kj, the sum enclosed in midpoint–radius form with an a-priori rounding bound
        let sr = 0, si = 0, tr = 0, ti = 0, rr = 0, ri = 0;
        for (let q = columnStart[j]!, end = columnStart[j + 1]!; q < end; q++) {
          const k = columnRows[q]!;
          const y = 2 * (i * n + k), c = 2 * (k * n + j);
          const yr = inverse[y]!, yi = inverse[y + 1]!, ayr = Math.abs(yr), ayi = Math.abs(yi);
          const cr = centres[c]!, ci = centres[c + 1]!, dr = radii[c]!, di = radii[c + 1]!;
          sr += yr * cr - yi * ci;
          si += yr * ci + yi * cr;
          tr += ayr * Math.abs(cr) + ayi * Math.abs(ci);
          ti += ayr * Math.abs(ci) + ayi * Math.abs(cr);
          rr += ayr * dr + ayi * di;
          ri += ayr * di + ayi * dr;
        }
        const terms = 2 * (columnStart[j + 1]! - columnStart[j]!);
        dotEnclosure(terms, sr, tr, rr, product, 0);
        dotEnclosure(terms, si, ti, ri, product, 2);
        const delta = i === j ? 1 : 0;
        const rl = widenDown(delta - product[1]!), rh = widenUp(delta - product[0]!), il = -product[3]!, ih = -product[2]!;
        // K_i += M_ij · (X_j − m_j)
        const o = 4 * j;
        const c0 = offset[o]!, c1 = offset[o + 1]!, d0 = offset[o + 2]!, d1 = offset[o + 3]!;
        kl = widenDown(kl + widenDown(mulLo(rl, rh, c0, c1) - mulHi(il, ih, d0, d1)));
        kh = widenUp(kh + widenUp(mulHi(rl, rh, c0, c1) - mulLo(il, ih, d0, d1)));
        ql = widenDown(ql + widenDown(mulLo(rl, rh, d0, d1) + mulLo(il, ih, c0, c1)));
        qh = widenUp(qh + widenUp(mulHi(rl, rh, d0, d1) + mulHi(il, ih, c0, c1)));
      }
      const o = 4 * i;
      enclosure[o] = kl; enclosure[o + 1] = kh; enclosure[o + 2] = ql; enclosure[o + 3] = qh;
      if (!(kl > box[o]! && kh < box[o + 1]! && ql > box[o + 2]! && qh < box[o + 3]!)) inside = false;
    }
    return inside;
  };
  return { test, enclosure };
}
