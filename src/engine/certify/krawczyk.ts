import { widenDown, widenUp } from '../interval/outward.ts';
import { midRadius } from '../interval/dot-bound.ts';
import { addProduct, matrixEntry, subtractScaled } from './krawczyk-kernels.ts';
import type { CertifiableSystem } from './certifiable-system.ts';

/**
 * Krawczyk's test (Krawczyk, Computing 4, 1969; Rump's form with an approximate inverse Y) on a complex box X
 * with centre m ∈ X: K(X) = m − Y·F(m) + (I − Y·J(X))·(X − m). If K(X) lies in the interior of X, the system
 * has exactly one zero in X (and it lies in K(X)). Every operation is outward rounded, so a pass is a proof; a
 * NaN or an overflow makes the test fail, never pass. The n³ part, Y·J(X), runs in midpoint–radius form with an
 * a-priori rounding bound (dot-bound.ts), sound and an order of magnitude cheaper than widening every term.
 * Buffers are made once per system; a test allocates nothing (krawczyk-kernels.ts).
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
  const work = new Float64Array(4), product = new Float64Array(10), acc = new Float64Array(4), entry = new Float64Array(4);
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
      // K_i = m_i − (Y·F(m))_i + Σ_j M_ij·(X_j − m_j), accumulated in acc
      acc[0] = acc[1] = centre[2 * i]!;
      acc[2] = acc[3] = centre[2 * i + 1]!;
      for (let k = 0; k < n; k++) subtractScaled(acc, inverse, 2 * (i * n + k), fm, 4 * k);
      for (let j = 0; j < n; j++) {
        matrixEntry(entry, i, j, n, inverse, centres, radii, columnRows, columnStart[j]!, columnStart[j + 1]!, product);
        addProduct(acc, entry, offset, 4 * j);
      }
      const o = 4 * i;
      enclosure[o] = acc[0]!; enclosure[o + 1] = acc[1]!; enclosure[o + 2] = acc[2]!; enclosure[o + 3] = acc[3]!;
      if (!(acc[0]! > box[o]! && acc[1]! < box[o + 1]! && acc[2]! > box[o + 2]! && acc[3]! < box[o + 3]!)) inside = false;
    }
    return inside;
  };
  return { test, enclosure };
}
