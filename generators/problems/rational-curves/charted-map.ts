import { exprBuilders as ops, type PolynomialSystem, type RandomSource } from '../../../src/engine/index.ts';
import type { ExprNode } from '../../../src/engine/index.ts';
import { incidenceEquations, mapParameters, tracedPoints } from './parametrised-map.ts';

/** How many of the map's unknowns the map chart scales: α (at t = 0), λ, μ and c₁ … c_{d−2}: 3d − 3. */
export const mapChartLength = (degree: number): number => 3 * degree - 3;

/** The chart's length: the map chart, then one pair (a_i, b_i) per traced point. */
export const chartLength = (degree: number): number => mapChartLength(degree) + 2 * tracedPoints(degree).length;

/** The working unknowns: α, λ, μ, c_k (x, y, z each), then the pair s_i, u_i of each traced point (t_i = u_i / s_i). */
export const chartedMapUnknowns = (degree: number): string[] => [
  'alpha', 'lambda', 'mu', ...Array.from({ length: degree - 2 }, (_, k) => ['x', 'y', 'z'].map((a) => `c${k + 1}${a}`)).flat(),
  ...tracedPoints(degree).flatMap((i) => [`s${i}`, `u${i}`]),
];

/**
 * The parametrised-map system in random affine charts: φ(0) = αP₁ with α an unknown and Σ a_k v_k = 1 over
 * v = (α, λ, μ, c_k), and each t_i homogenised to (s_i : u_i) with a_i s_i + b_i u_i = 1 (the chart: packed complex,
 * chartLength entries). Where fixing α = 1 and t_i affine leaves coefficients near 10⁻⁶ and t_i near 10³ (conditions
 * up to 10¹⁵), this keeps every coordinate of moderate size; same solutions up to v/α and t_i = u_i/s_i.
 */
export function chartedMapSystem(degree: number, chart: Float64Array): PolynomialSystem {
  const unknowns = chartedMapUnknowns(degree), parameters = mapParameters(degree);
  const u: Record<string, ExprNode> = Object.fromEntries(unknowns.map((n, i) => [n, ops.unknown(n, i)]));
  const q: Record<string, ExprNode> = Object.fromEntries(parameters.map((n, j) => [n, ops.param(n, j)]));
  const c = (k: number) => ops.constant(chart[2 * k]!, chart[2 * k + 1]!);
  const m = mapChartLength(degree);
  const mapChart = ops.sub(ops.add(...unknowns.slice(0, m).map((n, k) => ops.mul(c(k), u[n]!))), 1);
  const pairCharts = tracedPoints(degree).map((i, j) => ops.sub(ops.add(ops.mul(c(m + 2 * j), u[`s${i}`]!), ops.mul(c(m + 2 * j + 1), u[`u${i}`]!)), 1));
  return { unknowns, parameters, equations: [...incidenceEquations(degree, u, q, ops, u.alpha, true), mapChart, ...pairCharts] };
}

/** A random chart: chartLength(d) complex standard normal entries (packed complex). */
export function randomMapChart(degree: number, random: RandomSource): Float64Array {
  const chart = new Float64Array(2 * chartLength(degree));
  for (let k = 0; k < chart.length; k += 2) random.gaussianComplex(chart, k);
  return chart;
}

type Pair = [number, number];
const times = (a: Pair, b: Pair): Pair => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const inverse = ([re, im]: Pair): Pair => { const d = re * re + im * im; return [re / d, -im / d]; };
const at = (v: Float64Array, k: number): Pair => [v[2 * k]!, v[2 * k + 1]!];

/** 1 / Σ chart[offset + k]·x[offset + k] over `count` entries (complex; nonzero assumed). */
function inverseDot(x: Float64Array, chart: Float64Array, offset: number, count: number): Pair {
  let sum: Pair = [0, 0];
  for (let k = offset; k < offset + count; k++) { const p = times(at(chart, k), at(x, k)); sum = [sum[0] + p[0], sum[1] + p[1]]; }
  return inverse(sum);
}

/** x with entries [offset, offset + count) multiplied by f, in place. */
function scale(x: Float64Array, offset: number, count: number, f: Pair): void {
  for (let k = offset; k < offset + count; k++) x.set(times(at(x, k), f), 2 * k);
}

/** A working solution (any chart) put on the charts of `to`: the map part and each pair rescaled onto their chart equations (exact up to rounding). */
export function convertMapChart(degree: number, x: Float64Array, _from: Float64Array, to: Float64Array): Float64Array {
  const y = Float64Array.from(x), m = mapChartLength(degree);
  scale(y, 0, m, inverseDot(y, to, 0, m));
  tracedPoints(degree).forEach((_, j) => scale(y, m + 2 * j, 2, inverseDot(y, to, m + 2 * j, 2)));
  return y;
}

/** A shown solution (α = 1, t_i affine; mapUnknowns order) in the chart: α = 1 prepended, (s_i, u_i) = (1, t_i), then rescaled. */
export function shownToCharted(degree: number, shown: Float64Array, chart: Float64Array): Float64Array {
  const m = mapChartLength(degree) - 1;
  const ts = tracedPoints(degree).flatMap((_, j) => [1, 0, shown[2 * (m + j)]!, shown[2 * (m + j) + 1]!]);
  return convertMapChart(degree, Float64Array.from([1, 0, ...shown.slice(0, 2 * m), ...ts]), chart, chart);
}

/** A working solution in the shown unknowns: λ, μ, c_k divided by α, α dropped, t_i = u_i / s_i (α, s_i ≠ 0 assumed). */
export function chartedToShown(degree: number, x: Float64Array): Float64Array {
  const m = mapChartLength(degree);
  const byAlpha = inverse(at(x, 0));
  const map = Array.from({ length: m - 1 }, (_, k) => times(at(x, k + 1), byAlpha));
  const ts = tracedPoints(degree).map((_, j) => times(at(x, m + 2 * j + 1), inverse(at(x, m + 2 * j))));
  return Float64Array.from([...map, ...ts].flat());
}
