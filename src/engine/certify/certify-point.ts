import { inflateBox, startRadii } from './box-search.ts';
import type { CertifiableSystem } from './certifiable-system.ts';
import { invertComplex, multiplyComplex } from './complex-inverse.ts';
import { refineExactly } from './exact-refinement.ts';
import { createPointWorkspace } from './point-workspace.ts';

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

/**
 * Certifies one approximate solution: one Newton step (floating point) gives the centre m and Y ≈ J(x)⁻¹; boxes with
 * per-coordinate half-widths from the Newton step and |Y|·|F(m)| are inflated from K(X) until Krawczyk's test passes,
 * the attempts run out, or a half-width exceeds maxRadius·(1 + ‖x‖∞) (box-search.ts). With a real system (real
 * parameters and constants) a box centred at Re(m), symmetric about the real subspace, is tried first: a pass proves
 * the solution real. Where double-precision residuals fail, the same is tried after exact refinement.
 */
export function createPointCertifier(system: CertifiableSystem, options: PointCertifierOptions = {}): PointCertifier {
  const maxRadius = options.maxRadius ?? 1e-6;
  const attempts = options.attempts ?? 5;
  const ws = createPointWorkspace(system);
  const { n, values: f0, jacobian: j0, inverse, step, centre, box, tester } = ws;

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
        if (exact && !refineExactly(ws, realBox)) continue;
        if (realBox) for (let j = 0; j < n; j++) centre[2 * j + 1] = 0;
        startRadii(ws, exact);
        if (realBox) for (let j = 0; j < n; j++) ws.radii[j] = Math.max(ws.radii[j]!, 2 * Math.abs(newtonCentre[2 * j + 1]!));
        const r = inflateBox(ws, realBox, limit, attempts);
        if (r > 0) return { certified: true, certifiedReal: realBox, box: box.slice(), radius: r, enclosure: tester.enclosure.slice() };
      }
    }
    return fail(`Krawczyk's test failed on every box tried, up to half-width ${limit.toExponential(2)} (near-singular or clustered solution)`);
  };
  return { point, hull };
}
