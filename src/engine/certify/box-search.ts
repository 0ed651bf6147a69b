import { widenDown, widenUp } from '../interval/outward.ts';
import type { PointWorkspace } from './point-workspace.ts';

const FLOOR = 2 ** -44; // ≈ 5.7e-14, relative to 1 + |m_j|: a few ulps, so K_j can fit strictly inside

/**
 * Starting half-widths per coordinate around ws.centre: 2·(|Δx_j| + (|Y|·|F(m)|)_j), at least 2⁻⁴⁴(1 + |m_j|), with
 * F(m) (left in ws.centreValues for the test) in interval arithmetic, or exactly when `exact`. A heuristic: it decides
 * where to look, never what is proven.
 */
export function startRadii(ws: PointWorkspace, exact: boolean): void {
  const { n, centre, centreBox, centreValues, inverse, step, radii } = ws;
  for (let j = 0; j < n; j++) {
    centreBox[4 * j] = centreBox[4 * j + 1] = centre[2 * j]!;
    centreBox[4 * j + 2] = centreBox[4 * j + 3] = centre[2 * j + 1]!;
  }
  if (exact) ws.system.exactValues(centre, centreValues); else ws.system.intervalValues(centreBox, centreValues);
  for (let i = 0; i < n; i++) {
    let row = 0;
    for (let k = 0; k < n; k++) {
      const y = Math.abs(inverse[2 * (i * n + k)]!) + Math.abs(inverse[2 * (i * n + k) + 1]!);
      const v = 4 * k;
      row += y * Math.max(Math.abs(centreValues[v]!), Math.abs(centreValues[v + 1]!), Math.abs(centreValues[v + 2]!), Math.abs(centreValues[v + 3]!));
    }
    const size = Math.abs(centre[2 * i]!) + Math.abs(centre[2 * i + 1]!);
    radii[i] = Math.max(2 * (row + Math.abs(step[2 * i]!) + Math.abs(step[2 * i + 1]!)), FLOOR * (1 + size));
  }
}

/**
 * Tries boxes ws.centre ± ws.radii (the same half-width for the real and imaginary part of a coordinate), inflating
 * each radius to twice K(X)'s deviation in that coordinate after a failure (ε-inflation), for at most `attempts`
 * boxes with half-widths ≤ limit. When real, the centre is real and each imaginary interval is exactly [−r_j, r_j].
 * F(m) comes from ws.centreValues (startRadii). Returns the largest half-width on success (box in ws.box), else 0.
 */
export function inflateBox(ws: PointWorkspace, real: boolean, limit: number, attempts: number): number {
  const { n, centre, box, radii, tester } = ws;
  for (let a = 0; a < attempts; a++) {
    let largest = 0;
    for (let j = 0; j < n; j++) {
      const r = radii[j]!, mr = centre[2 * j]!, mi = centre[2 * j + 1]!;
      largest = Math.max(largest, r);
      box[4 * j] = widenDown(mr - r); box[4 * j + 1] = widenUp(mr + r);
      box[4 * j + 2] = real ? -r : widenDown(mi - r); box[4 * j + 3] = real ? r : widenUp(mi + r);
    }
    if (!(largest <= limit)) return 0;
    if (tester.test(box, centre, ws.inverse, ws.centreValues)) return largest;
    const k = tester.enclosure;
    for (let j = 0; j < n; j++) {
      const mr = centre[2 * j]!, mi = centre[2 * j + 1]!;
      const deviation = Math.max(Math.abs(k[4 * j]! - mr), Math.abs(k[4 * j + 1]! - mr), Math.abs(k[4 * j + 2]! - mi), Math.abs(k[4 * j + 3]! - mi));
      if (!(deviation < Infinity)) return 0; // NaN or overflow: more room will not help
      radii[j] = Math.max(radii[j]!, 2 * deviation);
    }
  }
  return 0;
}
