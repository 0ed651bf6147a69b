import type { FigureItem } from '../../../src/atlas/figure.ts';
import { sampleCurve, type PlaneWindow } from './contour.ts';

/**
 * The real plane curve Σ q[names[m]]·xⁱyʲ = 0 (exponents[m] = [i, j], further exponents must be 0) inside the
 * view, sampled by marching squares (accuracy about one cell) as polylines on the 'given' layer.
 */
export function planeCurveItems(q: Readonly<Record<string, number>>, names: readonly string[], exponents: readonly (readonly number[])[], view: PlaneWindow, label: string, cells = 160): FigureItem[] {
  const terms = exponents.map((e, m) => ({ c: q[names[m]!]!, i: e[0]!, j: e[1]!, rest: e.slice(2).some((k) => k !== 0) })).filter((t) => !t.rest);
  const f = (x: number, y: number) => terms.reduce((s, t) => s + t.c * x ** t.i * y ** t.j, 0);
  return sampleCurve(f, view, cells).map((points) => ({ shape: 'polyline', points, closed: false, layer: 'given', label }));
}
