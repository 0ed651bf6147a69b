import type { FigureItem } from '../../../src/atlas/figure.ts';
import type { PlaneWindow } from './contour.ts';

/**
 * The smallest rectangle containing every circle, point, polyline and real ellipse of the items and the crossing
 * points of every two lines (other conics and the lines themselves are unbounded and are ignored), widened by `margin` of its larger side on each side and made square-ish
 * so neither side is under a quarter of the other. Falls back to `fallback` when nothing is bounded.
 */
export function fitWindow(items: readonly FigureItem[], margin = 0.08, fallback: PlaneWindow = { xMin: -1, xMax: 1, yMin: -1, yMax: 1 }): PlaneWindow {
  let xMin = Infinity, xMax = -Infinity, yMin = Infinity, yMax = -Infinity;
  const include = (x: number, y: number): void => {
    if (!Number.isFinite(x) || !Number.isFinite(y)) return;
    xMin = Math.min(xMin, x); xMax = Math.max(xMax, x); yMin = Math.min(yMin, y); yMax = Math.max(yMax, y);
  };
  for (const item of items) {
    if (item.shape === 'circle') { include(item.cx - item.r, item.cy - item.r); include(item.cx + item.r, item.cy + item.r); }
    if (item.shape === 'point') include(item.x, item.y);
    if (item.shape === 'polyline') for (const [x, y] of item.points) include(x, y);
    if (item.shape === 'conic') {
      const box = ellipseBox(item.coefficients);
      if (box) { include(box[0], box[1]); include(box[2], box[3]); }
    }
  }
  const lines = items.filter((item) => item.shape === 'line');
  lines.forEach((l, i) => lines.slice(i + 1).forEach((m) => {
    const det = l.a * m.b - l.b * m.a;
    const scale = Math.hypot(l.a, l.b) * Math.hypot(m.a, m.b);
    if (Math.abs(det) > 1e-9 * scale) include((l.b * m.c - l.c * m.b) / det, (l.c * m.a - l.a * m.c) / det);
  }));
  if (xMin > xMax) return fallback;
  const side = Math.max(xMax - xMin, yMax - yMin, 1e-9);
  const w = Math.max(xMax - xMin, side / 4) / 2 + margin * side;
  const h = Math.max(yMax - yMin, side / 4) / 2 + margin * side;
  const cx = (xMin + xMax) / 2, cy = (yMin + yMax) / 2;
  return { xMin: cx - w, xMax: cx + w, yMin: cy - h, yMax: cy + h };
}

/** The bounding box [xMin, yMin, xMax, yMax] of the real ellipse ax² + bxy + cy² + dx + ey + f = 0, or null. */
function ellipseBox([a, b, c, d, e, f]: readonly number[]): [number, number, number, number] | null {
  const disc = 4 * a! * c! - b! * b!;
  if (!(disc > 1e-12 * (a! * a! + b! * b! + c! * c!))) return null;
  const x0 = (b! * e! - 2 * c! * d!) / disc;
  const y0 = (b! * d! - 2 * a! * e!) / disc;
  const k = -(a! * x0 * x0 + b! * x0 * y0 + c! * y0 * y0 + d! * x0 + e! * y0 + f!);
  if (!(k / a! > 0)) return null;
  const hx = Math.sqrt((4 * c! * k) / disc);
  const hy = Math.sqrt((4 * a! * k) / disc);
  return [x0 - hx, y0 - hy, x0 + hx, y0 + hy];
}
