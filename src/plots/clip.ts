import type { WorldWindow } from './world-window.ts';

/** A point [x, y] in world coordinates. */
export type Point = readonly [number, number];

/** Liang–Barsky: the part of segment p→q inside the window, or null; endpoints exact when inside. */
export function clipSegment(p: Point, q: Point, w: WorldWindow): [Point, Point] | null {
  const dx = q[0] - p[0], dy = q[1] - p[1];
  let t0 = 0, t1 = 1;
  const edges: [number, number][] = [[-dx, p[0] - w.xMin], [dx, w.xMax - p[0]], [-dy, p[1] - w.yMin], [dy, w.yMax - p[1]]];
  for (const [den, num] of edges) {
    if (den === 0) {
      if (num < 0) return null;
      continue;
    }
    const t = num / den;
    if (den < 0) { if (t > t1) return null; if (t > t0) t0 = t; }
    else { if (t < t0) return null; if (t < t1) t1 = t; }
  }
  return [[p[0] + t0 * dx, p[1] + t0 * dy], [p[0] + t1 * dx, p[1] + t1 * dy]];
}

/** The line a·x + b·y + c = 0 clipped to the window, or null (also for a = b = 0). */
export function clipLine(a: number, b: number, c: number, w: WorldWindow): [Point, Point] | null {
  const n = Math.hypot(a, b);
  if (!(n > 0) || !Number.isFinite(n) || !Number.isFinite(c)) return null;
  // Foot of the perpendicular from the window's centre, then a segment longer than the window's diagonal.
  const mx = (w.xMin + w.xMax) / 2, my = (w.yMin + w.yMax) / 2;
  const s = (a * mx + b * my + c) / (n * n);
  const fx = mx - a * s, fy = my - b * s;
  const half = Math.hypot(w.xMax - w.xMin, w.yMax - w.yMin) + Math.hypot(fx - mx, fy - my);
  const ux = -b / n, uy = a / n;
  return clipSegment([fx - half * ux, fy - half * uy], [fx + half * ux, fy + half * uy], w);
}

/** Splits a sampled curve into the runs inside the window, cutting each leaving/entering segment at the edge. */
export function clipPolyline(points: readonly Point[], w: WorldWindow, closed = false): Point[][] {
  const runs: Point[][] = [];
  let run: Point[] = [];
  const pts = closed && points.length > 1 ? [...points, points[0]!] : points;
  for (let i = 1; i < pts.length; i++) {
    const piece = clipSegment(pts[i - 1]!, pts[i]!, w);
    if (!piece) { if (run.length > 1) runs.push(run); run = []; continue; }
    const last = run.at(-1);
    if (!last || last[0] !== piece[0][0] || last[1] !== piece[0][1]) {
      if (run.length > 1) runs.push(run);
      run = [piece[0]];
    }
    run.push(piece[1]);
  }
  if (run.length > 1) runs.push(run);
  // A closed curve fully inside comes back as one run; rejoin a run split at the seam.
  if (closed && runs.length > 1) {
    const first = runs[0]!, lastRun = runs.at(-1)!;
    const a = lastRun.at(-1)!, b = first[0]!;
    if (a[0] === b[0] && a[1] === b[1]) { runs[0] = [...lastRun, ...first.slice(1)]; runs.pop(); }
  }
  return runs;
}
