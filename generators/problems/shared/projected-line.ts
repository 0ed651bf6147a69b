import type { FigureItem } from '../../../src/atlas/figure.ts';
import type { PlaneWindow } from './contour.ts';
import { clipLine } from './segment.ts';

/**
 * The image of the real projective line through the points p and q (homogeneous coordinates x₀, x₁, x₂, …; real)
 * under the projection (x₀ : x₁ : x₂ : …) ↦ (x₀ : x₁ : x₂), in the chart (x₁/x₀, x₂/x₀), clipped to the view: a
 * two-point polyline on the solution layer, a point when the image is a single point, nothing when it misses the view.
 */
export function projectedLineItems(p: readonly number[], q: readonly number[], view: PlaneWindow): FigureItem[] {
  const [base, other] = Math.abs(p[0]!) >= Math.abs(q[0]!) ? [p, q] : [q, p];
  if (Math.abs(base[0]!) < 1e-300) return [];
  const x = base[1]! / base[0]!, y = base[2]! / base[0]!;
  // The image's point at infinity: other − (other₀ / base₀)·base has x₀ = 0.
  const k = other[0]! / base[0]!;
  const dx = other[1]! - k * base[1]!, dy = other[2]! - k * base[2]!;
  const scaleOf = Math.max(Math.abs(other[1]!), Math.abs(other[2]!), Math.abs(k * base[1]!), Math.abs(k * base[2]!), 1e-300);
  if (Math.hypot(dx, dy) < 1e-12 * scaleOf) {
    return x >= view.xMin && x <= view.xMax && y >= view.yMin && y <= view.yMax ? [{ shape: 'point', x, y, layer: 'solution' }] : [];
  }
  const segment = clipLine(x, y, dx, dy, view);
  return segment ? [{ shape: 'polyline', points: segment, closed: false, layer: 'solution' }] : [];
}
