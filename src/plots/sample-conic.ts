import { clipLine, clipPolyline, type Point } from './clip.ts';
import type { WorldWindow } from './world-window.ts';

/** What kind of real curve a conic turned out to be. */
export type ConicKind = 'ellipse' | 'hyperbola' | 'parabola' | 'line-pair' | 'parallel-lines' | 'line' | 'point' | 'empty';

/** A sampled conic: its kind and the polylines (world coordinates) of its real points inside the window. */
export interface SampledConic { readonly kind: ConicKind; readonly runs: Point[][] }

/** Default samples per branch (ellipses: at least this many around the whole curve). */
export const CONIC_SAMPLES = 1200;

/**
 * Samples the real points of a·x² + b·xy + c·y² + d·x + e·y + f = 0 inside the window. Rotates to principal axes,
 * then parametrizes per case: ellipse (angle), hyperbola (cosh/sinh per branch), parabola (along its axis over the
 * window's extent), degenerate line pairs and parallel lines (clipped lines), a single point (empty run list).
 * Coefficients are scaled by their largest magnitude; "zero" means below 1e-10 after scaling. `samples` sets the
 * points per branch (ellipses: the minimum around the curve, more when it is large against the window).
 */
export function sampleConic(coefficients: readonly number[], w: WorldWindow, samples = CONIC_SAMPLES): SampledConic {
  const SAMPLES = Math.max(16, Math.floor(samples));
  if (coefficients.length !== 6 || !coefficients.every(Number.isFinite)) {
    throw new Error(`conic coefficients must be 6 finite numbers, got [${coefficients.join(', ')}]`);
  }
  const scale = Math.max(...coefficients.map(Math.abs));
  if (scale === 0) return { kind: 'empty', runs: [] };
  const [a, b, c, d, e, f] = coefficients.map((v) => v / scale) as [number, number, number, number, number, number];
  const eps = 1e-10;
  const th = 0.5 * Math.atan2(b, a - c), co = Math.cos(th), si = Math.sin(th);
  const l1 = a * co * co + b * co * si + c * si * si, l2 = a * si * si - b * si * co + c * co * co;
  const d1 = d * co + e * si, e1 = -d * si + e * co;
  const world = (u: number, v: number): Point => [u * co - v * si, u * si + v * co];
  // Line α·u + β·v + γ = 0 in principal coordinates, as a world line.
  const line = (al: number, be: number, ga: number) => clipLine(al * co - be * si, al * si + be * co, ga, w);
  const lines = (kind: ConicKind, ls: ([Point, Point] | null)[]): SampledConic =>
    ({ kind, runs: ls.filter((s): s is [Point, Point] => s !== null).map((s) => [s[0], s[1]]) });
  const corners: Point[] = [[w.xMin, w.yMin], [w.xMax, w.yMin], [w.xMin, w.yMax], [w.xMax, w.yMax]];
  const extent = (pick: (p: Point) => number) => [Math.min(...corners.map(pick)), Math.max(...corners.map(pick))] as const;
  const z1 = Math.abs(l1) < eps, z2 = Math.abs(l2) < eps;

  if (z1 && z2) {
    return Math.hypot(d, e) < eps ? { kind: 'empty', runs: [] } : lines('line', [clipLine(d, e, f, w)]);
  }
  if (z1 || z2) {
    // Parabola or parallel lines: q·s² + p·s + (lin)·t + f = 0 with s the curved direction, t the axis direction.
    const q = z2 ? l1 : l2, p = z2 ? d1 : e1, lin = z2 ? e1 : d1;
    const sOf = (pt: Point) => (z2 ? pt[0] * co + pt[1] * si : -pt[0] * si + pt[1] * co);
    const toWorld = (s: number, t: number) => (z2 ? world(s, t) : world(t, s));
    if (Math.abs(lin) >= eps) {
      const [s0, s1] = extent(sOf);
      const pts: Point[] = [];
      for (let i = 0; i <= SAMPLES; i++) {
        const s = s0 + ((s1 - s0) * i) / SAMPLES;
        pts.push(toWorld(s, -(q * s * s + p * s + f) / lin));
      }
      return { kind: 'parabola', runs: clipPolyline(pts, w) };
    }
    const disc = p * p - 4 * q * f;
    if (disc < -eps) return { kind: 'empty', runs: [] };
    const roots = disc <= eps ? [-p / (2 * q)] : [(-p + Math.sqrt(disc)) / (2 * q), (-p - Math.sqrt(disc)) / (2 * q)];
    return lines(roots.length === 1 ? 'line' : 'parallel-lines', roots.map((r) => (z2 ? line(1, 0, -r) : line(0, 1, -r))));
  }
  const u0 = -d1 / (2 * l1), v0 = -e1 / (2 * l2);
  const k = l1 * u0 * u0 + l2 * v0 * v0 - f;
  const kZero = Math.abs(k) <= eps * (Math.abs(l1 * u0 * u0) + Math.abs(l2 * v0 * v0) + Math.abs(f) + 1);
  const centre = world(u0, v0);
  if (l1 * l2 > 0) {
    if (kZero) return { kind: 'point', runs: [] };
    if (k / l1 < 0) return { kind: 'empty', runs: [] };
    const A = Math.sqrt(k / l1), B = Math.sqrt(k / l2);
    const diag = Math.hypot(w.xMax - w.xMin, w.yMax - w.yMin);
    const n = Math.min(200_000, Math.max(SAMPLES, Math.ceil((2 * Math.PI * Math.max(A, B)) / (diag / 400))));
    const pts: Point[] = [];
    for (let i = 0; i < n; i++) {
      const t = (2 * Math.PI * i) / n;
      pts.push(world(u0 + A * Math.cos(t), v0 + B * Math.sin(t)));
    }
    return { kind: 'ellipse', runs: clipPolyline(pts, w, true) };
  }
  if (kZero) {
    const r1 = Math.sqrt(Math.abs(l1)), r2 = Math.sqrt(Math.abs(l2));
    return lines('line-pair', [line(r1, r2, -(r1 * u0 + r2 * v0)), line(r1, -r2, -(r1 * u0 - r2 * v0))]);
  }
  // Hyperbola: along U (k/l1 > 0) or along V; branches ±; s runs until the curve is farther than any corner.
  const alongU = k / l1 > 0;
  const A = Math.sqrt(Math.abs(k / l1)), B = Math.sqrt(Math.abs(k / l2));
  const R = Math.max(...corners.map((p) => Math.hypot(p[0] - centre[0], p[1] - centre[1])));
  const major = alongU ? A : B, minor = alongU ? B : A;
  const sMax = Math.min(Math.acosh(Math.max(1, R / major)), Math.asinh(R / minor)) + 0.05;
  const runs: Point[][] = [];
  for (const branch of [1, -1]) {
    const pts: Point[] = [];
    for (let i = 0; i <= SAMPLES; i++) {
      const s = -sMax + (2 * sMax * i) / SAMPLES;
      const ch = branch * Math.cosh(s), sh = Math.sinh(s);
      pts.push(alongU ? world(u0 + A * ch, v0 + B * sh) : world(u0 + A * sh, v0 + B * ch));
    }
    runs.push(...clipPolyline(pts, w));
  }
  return { kind: 'hyperbola', runs };
}
