import type { PlaneWindow } from './contour.ts';

/**
 * The part of the line through (x, y) with direction (dx, dy) inside the window, as a two-point polyline
 * (Liang–Barsky clipping), or null when the line misses the window or the direction is zero.
 */
export function clipLine(x: number, y: number, dx: number, dy: number, w: PlaneWindow): [[number, number], [number, number]] | null {
  let lo = -Infinity, hi = Infinity;
  for (const [p, d, min, max] of [[x, dx, w.xMin, w.xMax], [y, dy, w.yMin, w.yMax]] as const) {
    if (Math.abs(d) < 1e-300) { if (p < min || p > max) return null; continue; }
    const a = (min - p) / d, b = (max - p) / d;
    lo = Math.max(lo, Math.min(a, b));
    hi = Math.min(hi, Math.max(a, b));
  }
  if (!(hi > lo) || !Number.isFinite(lo) || !Number.isFinite(hi)) return null;
  return [[x + lo * dx, y + lo * dy], [x + hi * dx, y + hi * dy]];
}
