import { line as d3line } from 'd3-shape';
import type { Figure, FigureItem } from '../atlas/figure.ts';
import { clipLine, clipPolyline, type Point } from './clip.ts';
import { CONIC_SAMPLES, sampleConic } from './sample-conic.ts';
import { windowScales } from './world-window.ts';

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
  readonly xTicks: { readonly at: number; readonly value: number }[];
  readonly yTicks: { readonly at: number; readonly value: number }[];
}

/** Radius in px of a drawn point. */
export const POINT_RADIUS = 4.5;

const round2 = (v: number) => Math.round(v * 100) / 100;
const pathOf = d3line<Point>().digits(2);

/** Drops screen points closer than `gap` px to the last kept one (first and last always kept): smaller paths, same look. */
export function thin(points: readonly Point[], gap: number): Point[] {
  if (points.length <= 2) return [...points];
  const out: Point[] = [points[0]!];
  for (let i = 1; i < points.length - 1; i++) {
    const p = points[i]!, q = out.at(-1)!;
    if (Math.hypot(p[0] - q[0], p[1] - q[1]) >= gap) out.push(p);
  }
  out.push(points.at(-1)!);
  return out;
}

/** Total conic sample points a figure may spend; many conics share it (at least 64 points per branch each). */
export const CONIC_SAMPLE_BUDGET = 60_000;

/**
 * Lays out a record's figure for an SVG of `width` px: circles as <circle>, conics sampled and clipped, lines and
 * polylines clipped to the window, points as small circles. Items that fall wholly outside the window are kept
 * (an empty path) so every drawn solution keeps its element. Only the items of the first `maxSolutions` solution
 * indices are drawn (the count left out is reported). Deterministic: coordinates rounded to 0.01 px.
 */
export function figureScene(figure: Figure, width = 640, maxSolutions = 200): Scene {
  const { x, y, height } = windowScales(figure.window, width);
  const solutionIds = [...new Set(figure.items.flatMap((it) => (it.solution === undefined ? [] : [it.solution])))].sort((a, b) => a - b);
  const kept = new Set(solutionIds.slice(0, maxSolutions));
  const items = figure.items.filter((it) => it.solution === undefined || kept.has(it.solution));
  const conics = items.filter((it) => it.shape === 'conic').length;
  const samples = Math.min(CONIC_SAMPLES, Math.max(64, Math.floor(CONIC_SAMPLE_BUDGET / Math.max(1, conics))));
  const toScreen = (p: Point): Point => [x(p[0]), y(p[1])];
  const runsPath = (runs: Point[][]) => runs.map((r) => pathOf(thin(r.map(toScreen), 1)) ?? '').join('');
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
        made = { ...base, tag: 'path', attrs: { d: runsPath(sampleConic(item.coefficients, figure.window, samples).runs) } };
        break;
      case 'line': {
        const seg = clipLine(item.a, item.b, item.c, figure.window);
        made = { ...base, tag: 'path', attrs: { d: seg ? runsPath([seg]) : '' } };
        break;
      }
      case 'polyline':
        made = { ...base, tag: 'path', attrs: { d: runsPath(clipPolyline(item.points, figure.window, item.closed)) } };
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
    xTicks: x.ticks(6).map((v) => ({ at: round2(x(v)), value: v })).filter((t) => t.at > 12 && t.at < width - 12),
    yTicks: y.ticks(6).map((v) => ({ at: round2(y(v)), value: v })).filter((t) => t.at > 12 && t.at < height - 12),
  };
}
