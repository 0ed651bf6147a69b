import type { FigureItem } from '../../../src/atlas/figure.ts';
import type { PlaneWindow } from './contour.ts';

/**
 * The smallest rectangle containing every circle, point and polyline of the items (conics and lines are
 * unbounded or implicit and are ignored), widened by `margin` of its larger side on each side and made square-ish
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
  }
  if (xMin > xMax) return fallback;
  const side = Math.max(xMax - xMin, yMax - yMin, 1e-9);
  const w = Math.max(xMax - xMin, side / 4) / 2 + margin * side;
  const h = Math.max(yMax - yMin, side / 4) / 2 + margin * side;
  const cx = (xMin + xMax) / 2, cy = (yMin + yMax) / 2;
  return { xMin: cx - w, xMax: cx + w, yMin: cy - h, yMax: cy + h };
}
