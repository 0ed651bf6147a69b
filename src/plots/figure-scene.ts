import { line as d3line } from 'd3-shape';
import type { Figure, FigureItem } from '../atlas/figure.ts';
import { clipLine, clipPolyline, type Point } from './clip.ts';
import { sampleConic } from './sample-conic.ts';
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
  readonly height: number;
  readonly layers: { readonly name: string; readonly items: SceneItem[] }[];
  readonly xTicks: { readonly at: number; readonly value: number }[];
  readonly yTicks: { readonly at: number; readonly value: number }[];
}

/** Radius in px of a drawn point. */
export const POINT_RADIUS = 4.5;

const round2 = (v: number) => Math.round(v * 100) / 100;
const pathOf = d3line<Point>().digits(2);

/**
 * Lays out a record's figure for an SVG of `width` px: circles as <circle>, conics sampled and clipped, lines and
 * polylines clipped to the window, points as small circles. Items that fall wholly outside the window are kept
 * (an empty path) so every solution keeps its element. Deterministic: coordinates rounded to 0.01 px.
 */
export function figureScene(figure: Figure, width = 640): Scene {
  const { x, y, height } = windowScales(figure.window, width);
  const toScreen = (p: Point): Point => [x(p[0]), y(p[1])];
  const runsPath = (runs: Point[][]) => runs.map((r) => pathOf(r.map(toScreen)) ?? '').join('');
  const layers = new Map<string, SceneItem[]>();
  figure.items.forEach((item, index) => {
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
        made = { ...base, tag: 'path', attrs: { d: runsPath(sampleConic(item.coefficients, figure.window).runs) } };
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
    layers: [...layers].map(([name, items]) => ({ name, items })),
    xTicks: x.ticks(6).map((v) => ({ at: round2(x(v)), value: v })).filter((t) => t.at > 12 && t.at < width - 12),
    yTicks: y.ticks(6).map((v) => ({ at: round2(y(v)), value: v })).filter((t) => t.at > 12 && t.at < height - 12),
  };
}
