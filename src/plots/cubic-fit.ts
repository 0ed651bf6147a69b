import type { Point } from './clip.ts';

/** A parametric curve on [t0, t1] with its velocity (both in the same coordinates, e.g. screen pixels). */
export interface ParametricCurve {
  readonly at: (t: number) => Point;
  readonly velocity: (t: number) => Point;
}

/** One cubic Bézier segment: start, two control points, end. */
export type Cubic = readonly [Point, Point, Point, Point];

/** An axis-aligned rectangle [xMin, xMax] × [yMin, yMax]. */
export interface Rect { readonly xMin: number; readonly xMax: number; readonly yMin: number; readonly yMax: number }

const MAX_DEPTH = 30;

/** The Hermite cubic of the curve on [a, b]: exact ends and end tangents (control points at ±(b − a)/3 · velocity). */
export function hermiteCubic(curve: ParametricCurve, a: number, b: number): Cubic {
  const p0 = curve.at(a), p3 = curve.at(b), v0 = curve.velocity(a), v3 = curve.velocity(b), h = (b - a) / 3;
  return [p0, [p0[0] + h * v0[0], p0[1] + h * v0[1]], [p3[0] - h * v3[0], p3[1] - h * v3[1]], p3];
}

/** The point of a cubic Bézier at u ∈ [0, 1]. */
export function cubicAt([p0, p1, p2, p3]: Cubic, u: number): Point {
  const v = 1 - u, a = v * v * v, b = 3 * v * v * u, c = 3 * v * u * u, d = u * u * u;
  return [a * p0[0] + b * p1[0] + c * p2[0] + d * p3[0], a * p0[1] + b * p1[1] + c * p2[1] + d * p3[1]];
}

/**
 * Cubic Bézier segments following the curve on [t0, t1] within `tolerance` (same units as the curve): the interval is
 * cut into `pieces` equal parts, and each part's Hermite cubic is halved until the curve at parameters ¼, ½, ¾ of the
 * part lies within the tolerance of the cubic at the same fractions (an upper bound on the distance between the two
 * curves for the smooth, slowly turning arcs of conics; the error of a Hermite cubic shrinks like h⁴ when halved).
 */
export function fitCubics(curve: ParametricCurve, t0: number, t1: number, tolerance: number, pieces = 4): Cubic[] {
  if (!(t1 > t0) || !(tolerance > 0)) throw new RangeError(`fitCubics: need t0 < t1 and tolerance > 0, got [${t0}, ${t1}] and ${tolerance}`);
  const out: Cubic[] = [];
  const fit = (a: number, b: number, depth: number): void => {
    const cubic = hermiteCubic(curve, a, b);
    const close = [0.25, 0.5, 0.75].every((u) => {
      const p = curve.at(a + u * (b - a)), q = cubicAt(cubic, u);
      return Math.hypot(p[0] - q[0], p[1] - q[1]) <= tolerance;
    });
    if (close || depth >= MAX_DEPTH) { out.push(cubic); return; }
    const m = 0.5 * (a + b);
    fit(a, m, depth + 1);
    fit(m, b, depth + 1);
  };
  for (let k = 0; k < pieces; k++) fit(t0 + ((t1 - t0) * k) / pieces, t0 + ((t1 - t0) * (k + 1)) / pieces, 0);
  return out;
}

const inside = (p: Point, r: Rect) => p[0] >= r.xMin && p[0] <= r.xMax && p[1] >= r.yMin && p[1] <= r.yMax;

/**
 * The parameter intervals on which the curve lies inside the rectangle, found on `samples` equal steps and refined
 * at each crossing by bisection to 1e-12 of the range. A closed curve's interval running through t1 continues at t0:
 * it is returned with t1 < end ≤ t1 + (t1 − t0) so that it can be drawn in one run. A curve wholly inside gives [t0, t1].
 */
export function insideIntervals(at: (t: number) => Point, t0: number, t1: number, rect: Rect, closed: boolean, samples = 720): [number, number][] {
  const step = (t1 - t0) / samples;
  const crossing = (a: number, b: number, aInside: boolean): number => {
    for (let k = 0; k < 60 && b - a > 1e-12 * (t1 - t0); k++) {
      const m = 0.5 * (a + b);
      if (inside(at(m), rect) === aInside) a = m; else b = m;
    }
    return aInside ? a : b;
  };
  const out: [number, number][] = [];
  let start: number | null = inside(at(t0), rect) ? t0 : null;
  for (let k = 1; k <= samples; k++) {
    const a = t0 + (k - 1) * step, b = k === samples ? t1 : t0 + k * step;
    const now = inside(at(b), rect);
    if (start === null && now) start = crossing(a, b, false);
    else if (start !== null && !now) { out.push([start, crossing(a, b, true)]); start = null; }
  }
  if (start !== null) out.push([start, t1]);
  if (closed && out.length > 1 && out[0]![0] === t0 && out.at(-1)![1] === t1) {
    const first = out.shift()!;
    out[out.length - 1] = [out.at(-1)![0], t1 + (first[1] - t0)];
  }
  return out.filter(([a, b]) => b > a);
}
