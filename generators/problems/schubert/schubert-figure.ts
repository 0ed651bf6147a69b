import type { DrawingDefinition } from '../../../src/atlas/definition.ts';
import type { FigureItem } from '../../../src/atlas/figure.ts';
import { fitWindow } from '../shared/fit-window.ts';
import { leftNullVector } from '../shared/left-null-vector.ts';
import { AXES, chartUnknowns, conditionCount, subspaceParameters, type SchubertShape } from './schubert-chart.ts';

// Oblique parallel projection of affine (n − 1)-space to the drawing plane, one column per axis x, y, z, w, v.
const PROJECTION = [
  [1, 0, 0.45, 0.2, -0.3],
  [0, 1, 0.3, -0.35, 0.25],
] as const;

function project(x: readonly number[]): [number, number] {
  return [0, 1].map((r) => x.reduce((s, v, i) => s + PROJECTION[r]![i]! * v, 0)) as [number, number];
}

/** The projection's formula in words, for the caption. */
function projectionText(dimension: number): string {
  const term = (c: number, axis: string) => (c === 0 ? '' : `${c < 0 ? ' − ' : ' + '}${Math.abs(c) === 1 ? '' : Math.abs(c)}${axis}`);
  const [u, w] = [0, 1].map((r) => AXES.slice(0, dimension).map((a, i) => term(PROJECTION[r]![i]!, a)).join('').replace(/^ \+ /, ''));
  return `(${AXES.slice(0, dimension).join(', ')}) ↦ (${u}, ${w})`;
}

/** Given subspace j as numbers: its point and its directions in affine (n − 1)-space. */
function subspaceOf(shape: SchubertShape, q: Readonly<Record<string, number>>, j: number): { point: number[]; directions: number[][] } {
  const names = subspaceParameters(shape, j);
  return { point: names.point.map((n) => q[n]!), directions: names.directions.map((d) => d.map((n) => q[n]!)) };
}

/** A patch of given subspace j: the parallelogram point ± h·e ± h·f (first two directions, each scaled to length 0.5), projected. */
function patch(shape: SchubertShape, q: Readonly<Record<string, number>>, j: number): FigureItem {
  const { point, directions } = subspaceOf(shape, q, j);
  const [e, f] = directions.slice(0, 2).map((d) => d.map((v) => (0.5 * v) / Math.hypot(...d)));
  const corner = (s: number, t: number) => project(point.map((v, i) => v + s * e![i]! + t * (f ? f[i]! : 0)));
  const points = f ? [corner(-1, -1), corner(1, -1), corner(1, 1), corner(-1, 1)] : [corner(-1, 0), corner(1, 0)];
  return { shape: 'polyline', points, closed: f !== undefined, layer: 'given', label: `given ${j}` };
}

/**
 * Where the solution (values of the chart's unknowns, real) meets given subspace j: the point c₁v₁ + … + c_kv_k of the
 * solution's rows v_r lying in the given subspace, from a left null vector of the stacked n × n matrix, in affine
 * coordinates (divided by its x₀, which is nonzero for points the chart sees). Null when the point is at infinity.
 */
function meetingPoint(shape: SchubertShape, values: readonly number[], q: Readonly<Record<string, number>>, j: number): number[] | null {
  const { k, n } = shape;
  const X = chartUnknowns(shape).map((row, r) => row.map((_, c) => values[r * (n - k) + c]!));
  const top = X.map((row, r) => [...Array.from({ length: k }, (_, c) => (c === r ? 1 : 0)), ...row]);
  const { point, directions } = subspaceOf(shape, q, j);
  const c = leftNullVector([...top, [1, ...point], ...directions.map((d) => [0, ...d])]);
  const homogeneous = top[0]!.map((_, i) => top.reduce((s, row, r) => s + c[r]! * row[i]!, 0));
  if (Math.abs(homogeneous[0]!) < 1e-9 * Math.max(...homogeneous.map(Math.abs))) return null;
  return homogeneous.slice(1).map((v) => v / homogeneous[0]!);
}

/**
 * The dots among `items` that are not far out: within 4 times the median distance of all dots (and at least the
 * configuration's own radius) from the centre of the configuration's points, so one remote meeting point does not
 * shrink the rest of the figure to a corner.
 */
function bulkOfDots(configuration: readonly FigureItem[], items: readonly FigureItem[]): FigureItem[] {
  const corners = configuration.flatMap((item) => (item.shape === 'polyline' ? item.points : []));
  const cx = corners.reduce((s, p) => s + p[0], 0) / corners.length, cy = corners.reduce((s, p) => s + p[1], 0) / corners.length;
  const away = (x: number, y: number) => Math.hypot(x - cx, y - cy);
  const dots = items.filter((item) => item.shape === 'point');
  const distances = dots.map((d) => away(d.x, d.y)).sort((a, b) => a - b);
  const radius = Math.max(4 * (distances[Math.floor(distances.length / 2)] ?? 0), ...corners.map(([x, y]) => away(x, y)));
  return dots.filter((d) => away(d.x, d.y) <= radius);
}

/**
 * The figure of a Schubert problem in the chart x₀ = 1, projected obliquely to the plane: each given subspace as a
 * small labelled patch around its point; each real solution as its projected line (k = 2, across the window, every
 * meeting point dotted) or as the triangle with corners where it meets the first, middle and last given subspaces (planes,
 * k = 3, corners dotted); the window fits the patches and the bulk of the dots (bulkOfDots).
 */
export function schubertDrawing(shape: SchubertShape, what: string): DrawingDefinition {
  // Planes: the triangle cut out by the first, middle and last given planes; lines: every meeting point.
  const m = conditionCount(shape);
  const shown = shape.k === 3 ? [1, Math.ceil(m / 2), m] : Array.from({ length: m }, (_, i) => i + 1);
  const given = shape.n - shape.k - 1 === 2 ? 'plane' : `${shape.n - shape.k - 1}-plane`;
  const configuration = (q: Readonly<Record<string, number>>) => Array.from({ length: conditionCount(shape) }, (_, i) => patch(shape, q, i + 1));
  return {
    projection: `${what} drawn by the oblique parallel projection ${projectionText(shape.n - 1)}; each given ${given} appears as a small square patch around its point (its projection covers the whole drawing), each real solution ${shape.k === 2 ? `as its projected line, and the dots mark where the solutions meet the given ${given}s.` : `as the triangle whose corners (dots) are the points where it meets given ${given}s ${shown.join(', ').replace(/, (\d+)$/, ' and $1')}.`} The window fits the patches and the bulk of the dots; a dot far from all the others may lie outside it.`,
    window: (q, items) => fitWindow([...configuration(q), ...bulkOfDots(configuration(q), items ?? [])], 0.05),
    configuration,
    solution: (values, q) => {
      const meets = shown.map((j) => meetingPoint(shape, values, q, j))
        .map((p, i) => (p ? { at: project(p), j: shown[i]! } : null))
        .filter((m): m is { at: [number, number]; j: number } => m !== null);
      const dots = meets.map(({ at, j }): FigureItem => ({ shape: 'point', x: at[0], y: at[1], layer: 'intersection', label: `meets given ${j}` }));
      if (meets.length < 2) return dots;
      if (shape.k === 3) return meets.length === 3 ? [{ shape: 'polyline', points: meets.map((m) => m.at), closed: true, layer: 'solution' }, ...dots] : dots;
      // A line projects to a line: the one through its two meeting points farthest apart, drawn across the window.
      const [p, r] = meets.flatMap((a) => meets.map((b) => [a.at, b.at] as const)).reduce((best, pair) => (Math.hypot(pair[0][0] - pair[1][0], pair[0][1] - pair[1][1]) > Math.hypot(best[0][0] - best[1][0], best[0][1] - best[1][1]) ? pair : best));
      const a = r[1] - p[1], b = p[0] - r[0];
      return [{ shape: 'line', a, b, c: -(a * p[0] + b * p[1]), layer: 'solution' }, ...dots];
    },
  };
}
