import { widenDown, widenUp } from '../interval/outward.ts';
import type { CertifiableSystem } from './compiled-system.ts';
import { invertComplex, multiplyComplex } from './complex-inverse.ts';
import { createKrawczykTester } from './krawczyk.ts';

/** The outcome for one approximate solution, before distinctness is settled. */
export interface PointCertificate {
  certified: boolean;
  certifiedReal: boolean;
  /** The box proven to hold exactly one solution: [reLo, reHi, imLo, imHi] per unknown (empty when not certified). */
  box: Float64Array;
  /** Largest half-width of the box over its coordinates (0 when not certified). */
  radius: number;
  /** Krawczyk's image K(X) ⊂ box, which holds the solution too: a tighter enclosure (empty when not certified). */
  enclosure: Float64Array;
  reason?: string;
}

/** Certifies single points, and tests a given box (for the hull of overlapping boxes). */
export interface PointCertifier {
  point(x: Float64Array, real: boolean): PointCertificate;
  hull(box: Float64Array): boolean;
}

/** Tuning that decides how hard to try, never what counts as a proof. */
export interface PointCertifierOptions {
  /** Largest box half-width tried, relative to 1 + ‖x‖∞ (default 1e-6): the point must be this close to its solution. */
  maxRadius?: number;
  /** ε-inflation attempts per box kind (default 5). */
  attempts?: number;
}

const FLOOR = 2 ** -44; // ≈ 5.7e-14, relative to 1 + |m_j|: a few ulps, so K_j can fit strictly inside

/**
 * Certifies one approximate solution: one Newton step (floating point) gives the centre m and Y ≈ J(x)⁻¹; boxes with
 * per-coordinate half-widths from the Newton step and |Y|·|F(m)| are inflated from K(X) until Krawczyk's test passes,
 * the attempts run out, or a half-width exceeds maxRadius·(1 + ‖x‖∞). With a real system (real parameters and constants) a box centred at Re(m), symmetric
 * about the real subspace, is tried first: a pass proves the solution real.
 */
export function createPointCertifier(system: CertifiableSystem, options: PointCertifierOptions = {}): PointCertifier {
  const n = system.size;
  const maxRadius = options.maxRadius ?? 1e-6;
  const attempts = options.attempts ?? 5;
  const tester = createKrawczykTester(system);
  const f0 = new Float64Array(2 * n), j0 = new Float64Array(2 * n * n), inverse = new Float64Array(2 * n * n);
  const step = new Float64Array(2 * n), centre = new Float64Array(2 * n), box = new Float64Array(4 * n);
  const centreBox = new Float64Array(4 * n), centreValues = new Float64Array(4 * n), radii = new Float64Array(n);

  /**
   * Starting half-widths per coordinate: 2·(|Δx_j| + (|Y|·|F(m)|)_j) with F(m) in interval arithmetic (so its rounding
   * noise counts), at least 2⁻⁴⁴(1 + |m_j|). A heuristic: it decides where to look, not what is proven.
   */
  const startRadii = (exact: boolean): void => {
    for (let j = 0; j < n; j++) {
      centreBox[4 * j] = centreBox[4 * j + 1] = centre[2 * j]!;
      centreBox[4 * j + 2] = centreBox[4 * j + 3] = centre[2 * j + 1]!;
    }
    if (exact) system.exactValues(centre, centreValues); else system.intervalValues(centreBox, centreValues);
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
  };

  /**
   * Tries boxes centre ± radii (per coordinate, the same for real and imaginary parts), inflating each radius to twice
   * the deviation of K(X) in that coordinate after a failure (ε-inflation). When real, the centre's imaginary parts are
   * set to 0 and each imaginary interval is exactly [−r_j, r_j]. Returns the largest radius on success, else 0.
   */
  const inflate = (real: boolean, limit: number): number => {
    for (let a = 0; a < attempts; a++) {
      let largest = 0;
      for (let j = 0; j < n; j++) {
        const r = radii[j]!, mr = centre[2 * j]!, mi = centre[2 * j + 1]!;
        largest = Math.max(largest, r);
        box[4 * j] = widenDown(mr - r); box[4 * j + 1] = widenUp(mr + r);
        box[4 * j + 2] = real ? -r : widenDown(mi - r); box[4 * j + 3] = real ? r : widenUp(mi + r);
      }
      if (!(largest <= limit)) return 0;
      if (tester.test(box, centre, inverse, centreValues)) return largest; // F(m) from startRadii, same centre
      const k = tester.enclosure;
      for (let j = 0; j < n; j++) {
        const mr = centre[2 * j]!, mi = centre[2 * j + 1]!;
        const deviation = Math.max(Math.abs(k[4 * j]! - mr), Math.abs(k[4 * j + 1]! - mr), Math.abs(k[4 * j + 2]! - mi), Math.abs(k[4 * j + 3]! - mi));
        if (!(deviation < Infinity)) return 0; // NaN or overflow: more room will not help
        radii[j] = Math.max(radii[j]!, 2 * deviation);
      }
    }
    return 0;
  };

  /**
   * Fallback for ill-conditioned solutions: Newton steps m ← m − J(m)⁻¹F(m) with F(m) evaluated exactly (so the
   * residual is not drowned in rounding noise), a fresh Y = J(m)⁻¹, and F(m) enclosed exactly in the test.
   * False when the Jacobian turns singular.
   */
  const refine = (real: boolean): boolean => {
    for (let iteration = 0; iteration < 3; iteration++) {
      if (real) for (let j = 0; j < n; j++) centre[2 * j + 1] = 0;
      system.pointJacobian(centre, f0, j0);
      if (!invertComplex(j0, n, inverse)) return false;
      if (iteration === 2) break;
      system.exactValues(centre, centreValues);
      for (let k = 0; k < 2 * n; k++) f0[k] = 0.5 * centreValues[2 * k]! + 0.5 * centreValues[2 * k + 1]!;
      multiplyComplex(inverse, f0, n, step);
      for (let k = 0; k < 2 * n; k++) centre[k] = centre[k]! - step[k]!;
    }
    return true;
  };

  /** Krawczyk's test on the given box (4n) around its midpoint, once, with Y from the midpoint: true proves one zero. */
  const hull = (given: Float64Array): boolean => {
    for (let j = 0; j < 2 * n; j++) centre[j] = 0.5 * given[2 * j]! + 0.5 * given[2 * j + 1]!;
    system.pointJacobian(centre, f0, j0);
    if (!invertComplex(j0, n, inverse)) return false;
    return tester.test(given, centre, inverse);
  };

  const point = (x: Float64Array, real: boolean): PointCertificate => {
    const fail = (reason: string): PointCertificate => ({ certified: false, certifiedReal: false, box: new Float64Array(0), radius: 0, enclosure: new Float64Array(0), reason });
    let size = 0;
    for (let k = 0; k < 2 * n; k++) size = Math.max(size, Math.abs(x[k]!));
    if (!(size < Infinity)) return fail('the point has a coordinate that is not finite');
    const scale = 1 + size;
    system.pointJacobian(x, f0, j0);
    if (!invertComplex(j0, n, inverse)) return fail('the Jacobian is singular at the point (zero or non-finite pivot)');
    multiplyComplex(inverse, f0, n, step);
    let stepSize = 0;
    for (let k = 0; k < 2 * n; k++) stepSize = Math.max(stepSize, Math.abs(step[k]!));
    const limit = maxRadius * scale;
    if (!(4 * stepSize <= limit)) {
      return fail(`not close enough to a solution: the Newton step ${stepSize.toExponential(2)} exceeds the bound ${(limit / 4).toExponential(2)}`);
    }
    for (let k = 0; k < 2 * n; k++) centre[k] = x[k]! - step[k]!;
    let imaginary = 0;
    for (let j = 0; j < n; j++) imaginary = Math.max(imaginary, Math.abs(centre[2 * j + 1]!));
    const realFirst = real && imaginary <= limit;
    const newtonCentre = x.map((v, k) => v - step[k]!);
    // double-precision interval evaluation first; exact evaluation of F(m) only where that fails
    for (const exact of [false, true]) {
      for (const realBox of realFirst ? [true, false] : [false]) {
        centre.set(newtonCentre);
        if (exact && !refine(realBox)) continue;
        if (realBox) for (let j = 0; j < n; j++) centre[2 * j + 1] = 0;
        startRadii(exact);
        if (realBox) for (let j = 0; j < n; j++) radii[j] = Math.max(radii[j]!, 2 * Math.abs(newtonCentre[2 * j + 1]!));
        const r = inflate(realBox, limit);
        if (r > 0) return { certified: true, certifiedReal: realBox, box: box.slice(), radius: r, enclosure: tester.enclosure.slice() };
      }
    }
    return fail(`Krawczyk's test failed on every box tried, up to half-width ${limit.toExponential(2)} (near-singular or clustered solution)`);
  };
  return { point, hull };
}
