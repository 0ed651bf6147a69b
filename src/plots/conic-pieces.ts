import { clipLine, type Point } from './clip.ts';
import type { WorldWindow } from './world-window.ts';

/** What kind of real curve a conic turned out to be. */
export type ConicKind = 'ellipse' | 'hyperbola' | 'parabola' | 'line-pair' | 'parallel-lines' | 'line' | 'point' | 'empty';

/** A smooth parametric branch in world coordinates: its point and velocity at t ∈ [t0, t1] (closed: t1 joins t0). */
export interface ConicBranch {
  readonly at: (t: number) => Point;
  readonly velocity: (t: number) => Point;
  readonly t0: number;
  readonly t1: number;
  readonly closed: boolean;
}

/** A conic's real points near a window: smooth branches, and straight segments for the degenerate kinds. */
export interface ConicPieces {
  readonly kind: ConicKind;
  readonly branches: readonly ConicBranch[];
  readonly segments: readonly (readonly [Point, Point])[];
}

/**
 * The real points of a·x² + b·xy + c·y² + d·x + e·y + f = 0 that can reach the window, exactly parametrised:
 * rotated to principal axes, an ellipse is (u₀ + A cos t, v₀ + B sin t), a hyperbola branch (u₀ ± A cosh s, v₀ + B sinh s)
 * with |s| up to where the branch is farther than every window corner, a parabola a quadratic graph over the window's
 * extent along its axis; line pairs, parallel and double lines come back as segments clipped to the window.
 * Coefficients are scaled by their largest magnitude; "zero" means below 1e-10 after scaling.
 */
export function conicPieces(coefficients: readonly number[], w: WorldWindow): ConicPieces {
  if (coefficients.length !== 6 || !coefficients.every(Number.isFinite)) {
    throw new Error(`conic coefficients must be 6 finite numbers, got [${coefficients.join(', ')}]`);
  }
  const none = (kind: ConicKind): ConicPieces => ({ kind, branches: [], segments: [] });
  const scale = Math.max(...coefficients.map(Math.abs));
  if (scale === 0) return none('empty');
  const [a, b, c, d, e, f] = coefficients.map((v) => v / scale) as [number, number, number, number, number, number];
  const eps = 1e-10;
  const th = 0.5 * Math.atan2(b, a - c), co = Math.cos(th), si = Math.sin(th);
  const l1 = a * co * co + b * co * si + c * si * si, l2 = a * si * si - b * si * co + c * co * co;
  const d1 = d * co + e * si, e1 = -d * si + e * co;
  const world = (u: number, v: number): Point => [u * co - v * si, u * si + v * co];
  const lines = (kind: ConicKind, ls: ([Point, Point] | null)[]): ConicPieces =>
    ({ kind, branches: [], segments: ls.filter((s): s is [Point, Point] => s !== null) });
  // Line α·u + β·v + γ = 0 in principal coordinates, as a world line clipped to the window.
  const line = (al: number, be: number, ga: number) => clipLine(al * co - be * si, al * si + be * co, ga, w);
  const corners: Point[] = [[w.xMin, w.yMin], [w.xMax, w.yMin], [w.xMin, w.yMax], [w.xMax, w.yMax]];
  const z1 = Math.abs(l1) < eps, z2 = Math.abs(l2) < eps;

  if (z1 && z2) return Math.hypot(d, e) < eps ? none('empty') : lines('line', [clipLine(d, e, f, w)]);
  if (z1 || z2) {
    // Parabola or parallel lines: q·s² + p·s + lin·t + f = 0 with s the curved direction, t the axis direction.
    const q = z2 ? l1 : l2, p = z2 ? d1 : e1, lin = z2 ? e1 : d1;
    const toWorld = (s: number, t: number) => (z2 ? world(s, t) : world(t, s));
    if (Math.abs(lin) >= eps) {
      const along = corners.map((pt) => (z2 ? pt[0] * co + pt[1] * si : -pt[0] * si + pt[1] * co));
      return {
        kind: 'parabola',
        segments: [],
        branches: [{
          at: (s) => toWorld(s, -(q * s * s + p * s + f) / lin),
          velocity: (s) => toWorld(1, -(2 * q * s + p) / lin),
          t0: Math.min(...along), t1: Math.max(...along), closed: false,
        }],
      };
    }
    const disc = p * p - 4 * q * f;
    if (disc < -eps) return none('empty');
    const roots = disc <= eps ? [-p / (2 * q)] : [(-p + Math.sqrt(disc)) / (2 * q), (-p - Math.sqrt(disc)) / (2 * q)];
    return lines(roots.length === 1 ? 'line' : 'parallel-lines', roots.map((r) => (z2 ? line(1, 0, -r) : line(0, 1, -r))));
  }
  const u0 = -d1 / (2 * l1), v0 = -e1 / (2 * l2);
  const k = l1 * u0 * u0 + l2 * v0 * v0 - f;
  const kZero = Math.abs(k) <= eps * (Math.abs(l1 * u0 * u0) + Math.abs(l2 * v0 * v0) + Math.abs(f) + 1);
  const centre = world(u0, v0);
  if (l1 * l2 > 0) {
    if (kZero) return none('point');
    if (k / l1 < 0) return none('empty');
    const A = Math.sqrt(k / l1), B = Math.sqrt(k / l2);
    return {
      kind: 'ellipse',
      segments: [],
      branches: [{
        at: (t) => world(u0 + A * Math.cos(t), v0 + B * Math.sin(t)),
        velocity: (t) => world(-A * Math.sin(t), B * Math.cos(t)),
        t0: 0, t1: 2 * Math.PI, closed: true,
      }],
    };
  }
  if (kZero) {
    const r1 = Math.sqrt(Math.abs(l1)), r2 = Math.sqrt(Math.abs(l2));
    return lines('line-pair', [line(r1, r2, -(r1 * u0 + r2 * v0)), line(r1, -r2, -(r1 * u0 - r2 * v0))]);
  }
  // Hyperbola: along U (k/l1 > 0) or along V; s runs until the branch is farther than every corner.
  const alongU = k / l1 > 0;
  const A = Math.sqrt(Math.abs(k / l1)), B = Math.sqrt(Math.abs(k / l2));
  const R = Math.max(...corners.map((pt) => Math.hypot(pt[0] - centre[0], pt[1] - centre[1])));
  const major = alongU ? A : B, minor = alongU ? B : A;
  const sMax = Math.min(Math.acosh(Math.max(1, R / major)), Math.asinh(R / minor)) + 0.05;
  const branch = (sign: number): ConicBranch => ({
    at: (s) => (alongU ? world(u0 + sign * A * Math.cosh(s), v0 + B * Math.sinh(s)) : world(u0 + A * Math.sinh(s), v0 + sign * B * Math.cosh(s))),
    velocity: (s) => (alongU ? world(sign * A * Math.sinh(s), B * Math.cosh(s)) : world(A * Math.cosh(s), sign * B * Math.sinh(s))),
    t0: -sMax, t1: sMax, closed: false,
  });
  return { kind: 'hyperbola', segments: [], branches: [branch(1), branch(-1)] };
}
