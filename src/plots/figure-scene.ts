import { simplifyPolyline } from './simplify-polyline.ts';
import { line as d3line } from 'd3-shape';
import type { Figure, FigureItem } from '../atlas/figure.ts';
import { clipLine, clipPolyline, type Point } from './clip.ts';
import { conicPath } from './conic-path.ts';
import { expandWindow, windowScales } from './world-window.ts';
import { axisTicks, type Tick } from './axis-ticks.ts';
import { MARGIN, POINT_RADIUS } from './figure-constants.ts';

/** One SVG element of a figure, in screen coordinates (2 decimals): a <circle> or a <path>. */
export interface SceneItem {
  readonly tag: 'circle' | 'path';
  readonly kind: FigureItem['shape'];
  readonly layer: string;
  readonly solution: number | null;
  readonly label: string | null;
  readonly attrs: Readonly<Record<string, string | number>>;
}

/** The figure as layers of screen items (layers in order of first appearance), with grid ticks at least 12 px inside the frame. */
export interface Scene {
  readonly width: number;
  /** Solutions drawn, and solutions in the figure left undrawn because of `maxSolutions`. */
  readonly drawnSolutions: number;
  readonly omittedSolutions: number;
  readonly height: number;
  readonly layers: { readonly name: string; readonly items: SceneItem[] }[];
  readonly xTicks: Tick[];
  readonly yTicks: Tick[];
}

export { MARGIN, POINT_RADIUS };

/** Largest distance in px between a drawn conic and the true one at the figure's own scale. */
export const CURVE_TOLERANCE = 0.02;

const round2 = (v: number) => Math.round(v * 100) / 100;
const pathOf = d3line<Point>().digits(2);

/** Distance in the plane from p to the line through a and b (to a itself when a = b). */
function offLine(p: Point, a: Point, b: Point): number {
  const dx = b[0] - a[0], dy = b[1] - a[1], len = Math.hypot(dx, dy);
  return len === 0 ? Math.hypot(p[0] - a[0], p[1] - a[1]) : Math.abs(dy * (p[0] - a[0]) - dx * (p[1] - a[1])) / len;
}

/**
 * Douglas–Peucker in the plane (simplify-polyline.ts), distances to the line through the kept ends: no dropped point
 * lies farther than `tolerance` from the kept polyline (first and last always kept). Smaller paths, the same look at
 * every zoom the page allows.
 */
export function simplify(points: readonly Point[], tolerance: number): Point[] {
  return simplifyPolyline(points, tolerance, offLine);
}

/**
 * Lays out a record's figure for an SVG of `width` px: circles as <circle>, conics as cubic Bézier paths within
 * CURVE_TOLERANCE px of the true curve, lines and polylines clipped (polylines simplified to the same tolerance),
 * points as small circles. Curves extend MARGIN beyond the window on every side. Items that fall wholly outside are
 * kept (an empty path) so every drawn solution keeps its element. Only the items of the first `maxSolutions`
 * solution indices are drawn (the count left out is reported). Deterministic: coordinates rounded to 0.01 px.
 */
export function figureScene(figure: Figure, width = 640, maxSolutions = 200): Scene {
  const { x, y, height } = windowScales(figure.window, width);
  const solutionIds = [...new Set(figure.items.flatMap((it) => (it.solution === undefined ? [] : [it.solution])))].sort((a, b) => a - b);
  const kept = new Set(solutionIds.slice(0, maxSolutions));
  const items = figure.items.filter((it) => it.solution === undefined || kept.has(it.solution));
  const outer = expandWindow(figure.window, MARGIN);
  const toScreen = (p: Point): Point => [x(p[0]), y(p[1])];
  const runsPath = (runs: Point[][]) => runs.map((r) => pathOf(simplify(r.map(toScreen), CURVE_TOLERANCE)) ?? '').join('');
  const layers = new Map<string, SceneItem[]>();
  items.forEach((item, index) => {
    const base = { kind: item.shape, layer: item.layer, solution: item.solution ?? null, label: item.label ?? null };
    let made: SceneItem;
    switch (item.shape) {
      case 'circle':
        made = { ...base, tag: 'circle', attrs: { cx: round2(x(item.cx)), cy: round2(y(item.cy)), r: round2(Math.abs(x(item.r) - x(0))) } };
        break;
      case 'point':
        made = { ...base, tag: 'circle', attrs: { cx: round2(x(item.x)), cy: round2(y(item.y)), r: POINT_RADIUS } };
        break;
      case 'conic':
        made = { ...base, tag: 'path', attrs: { d: conicPath(item.coefficients, outer, x, y, CURVE_TOLERANCE) } };
        break;
      case 'line': {
        const seg = clipLine(item.a, item.b, item.c, outer);
        made = { ...base, tag: 'path', attrs: { d: seg ? runsPath([seg]) : '' } };
        break;
      }
      case 'polyline':
        made = { ...base, tag: 'path', attrs: { d: runsPath(clipPolyline(item.points, outer, item.closed)) } };
        break;
      default:
        throw new Error(`figure item ${index}: unknown shape ${JSON.stringify((item as { shape: unknown }).shape)}`);
    }
    const list = layers.get(item.layer) ?? [];
    list.push(made);
    layers.set(item.layer, list);
  });
  return {
    width,
    height,
    drawnSolutions: kept.size,
    omittedSolutions: solutionIds.length - kept.size,
    layers: [...layers].map(([name, items]) => ({ name, items })),
    ...axisTicks(x, y, width, height),
  };
}
