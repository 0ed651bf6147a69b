import { exprBuilders as ops, type PolynomialSystem, type RandomSource } from '../../../src/engine/index.ts';
import type { ExprNode } from '../../../src/engine/index.ts';
import { incidenceEquations, mapParameters, mapUnknowns } from './parametrised-map.ts';

/** How many of the map's unknowns the chart scales: α (at t = 0), λ, μ and c₁ … c_{d−2}: 3d − 3. */
export const chartLength = (degree: number): number => 3 * degree - 3;

/** The working unknowns: α, then mapUnknowns(d) (λ, μ, c_k, t_i). */
export const chartedMapUnknowns = (degree: number): string[] => ['alpha', ...mapUnknowns(degree)];

/**
 * The parametrised-map system in a random affine chart of the map's projective coefficient space: φ(0) = αP₁ with α
 * an unknown, and Σ a_k v_k = 1 over v = (α, λ, μ, c_k) with the chart a (packed complex, chartLength entries). It keeps
 * every map coefficient of moderate size where fixing α = 1 lets them reach 10⁵; same solutions up to the scaling v/α.
 */
export function chartedMapSystem(degree: number, chart: Float64Array): PolynomialSystem {
  const unknowns = chartedMapUnknowns(degree), parameters = mapParameters(degree);
  const u: Record<string, ExprNode> = Object.fromEntries(unknowns.map((n, i) => [n, ops.unknown(n, i)]));
  const q: Record<string, ExprNode> = Object.fromEntries(parameters.map((n, j) => [n, ops.param(n, j)]));
  const scaled = unknowns.slice(0, chartLength(degree));
  const chartEquation = ops.sub(ops.add(...scaled.map((n, k) => ops.mul(ops.constant(chart[2 * k]!, chart[2 * k + 1]!), u[n]!))), 1);
  return { unknowns, parameters, equations: [...incidenceEquations(degree, u, q, ops, u.alpha), chartEquation] };
}

/** A random chart: chartLength(d) complex standard normal entries (packed complex). */
export function randomMapChart(degree: number, random: RandomSource): Float64Array {
  const chart = new Float64Array(2 * chartLength(degree));
  for (let k = 0; k < chart.length; k += 2) random.gaussianComplex(chart, k);
  return chart;
}

/** x with its first `count` complex entries multiplied by s (packed complex; a new array). */
function scaleLeading(x: Float64Array, count: number, [sr, si]: readonly [number, number]): Float64Array {
  const y = Float64Array.from(x);
  for (let k = 0; k < count; k++) {
    const re = x[2 * k]!, im = x[2 * k + 1]!;
    y[2 * k] = re * sr - im * si; y[2 * k + 1] = re * si + im * sr;
  }
  return y;
}

/** 1 / (a · v) for the chart a and the leading entries v of x (complex; a · v ≠ 0 assumed). */
function chartInverse(x: Float64Array, chart: Float64Array): [number, number] {
  let re = 0, im = 0;
  for (let k = 0; k < chart.length / 2; k++) {
    const ar = chart[2 * k]!, ai = chart[2 * k + 1]!, vr = x[2 * k]!, vi = x[2 * k + 1]!;
    re += ar * vr - ai * vi; im += ar * vi + ai * vr;
  }
  const d = re * re + im * im;
  return [re / d, -im / d];
}

/** A working solution moved to another chart: the scaled entries divided by (to · v) (exact up to rounding). */
export function convertMapChart(degree: number, x: Float64Array, _from: Float64Array, to: Float64Array): Float64Array {
  return scaleLeading(x, chartLength(degree), chartInverse(x, to));
}

/** A shown solution (α = 1, mapUnknowns order) in the chart: α = 1 prepended, then scaled onto a · v = 1. */
export function shownToCharted(degree: number, shown: Float64Array, chart: Float64Array): Float64Array {
  return convertMapChart(degree, Float64Array.from([1, 0, ...shown]), chart, chart);
}

/** A working solution in the shown unknowns: λ, μ, c_k divided by α, α dropped, t_i kept (α ≠ 0 assumed). */
export function chartedToShown(degree: number, x: Float64Array): Float64Array {
  const d = x[0]! * x[0]! + x[1]! * x[1]!;
  return scaleLeading(x, chartLength(degree), [x[0]! / d, -x[1]! / d]).slice(2);
}
