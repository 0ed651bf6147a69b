import type { FigureItem } from '../../../src/atlas/figure.ts';

/**
 * The real branch directions at a double point (x, y) of the plane curve Σ c[m]·xⁱyʲ = 0 (exponents[m] = [i, j]):
 * the real roots of its second-order part f_xx·u² + 2f_xy·uv + f_yy·v² as two short segments of half-length `reach`
 * through the point on the given layer; none at an isolated real point (complex directions) or a degenerate part.
 */
export function nodeBranches(coefficients: readonly number[], exponents: readonly (readonly number[])[], x: number, y: number, reach: number, layer: string): FigureItem[] {
  let fxx = 0, fxy = 0, fyy = 0;
  exponents.forEach(([i, j], m) => {
    const c = coefficients[m]!;
    if (i! >= 2) fxx += c * i! * (i! - 1) * x ** (i! - 2) * y ** j!;
    if (i! >= 1 && j! >= 1) fxy += c * i! * j! * x ** (i! - 1) * y ** (j! - 1);
    if (j! >= 2) fyy += c * j! * (j! - 1) * x ** i! * y ** (j! - 2);
  });
  const disc = fxy * fxy - fxx * fyy;
  const scale = fxx * fxx + fxy * fxy + fyy * fyy;
  if (!(disc > 1e-12 * scale)) return [];
  // Directions (u, v) with fxx·u² + 2fxy·uv + fyy·v² = 0: each root in its two forms (fyy, −fxy ± √disc) and
  // (−fxy ∓ √disc, fxx), which are parallel; the longer is kept, so that neither vanishes.
  const r = Math.sqrt(disc);
  const longer = (a: [number, number], b: [number, number]): [number, number] => (Math.hypot(...a) >= Math.hypot(...b) ? a : b);
  const directions = [longer([fyy, -fxy + r], [-fxy - r, fxx]), longer([fyy, -fxy - r], [-fxy + r, fxx])];
  return directions.map(([u, v]) => {
    const n = Math.hypot(u, v);
    const [du, dv] = [(reach * u) / n, (reach * v) / n];
    return { shape: 'polyline', points: [[x - du, y - dv], [x + du, y + dv]], closed: false, layer };
  });
}
