import type { ArrowheadLayout } from '../../../src/engine/index.ts';

/**
 * Index layout of the tangency-point formulation of "conics through p points tangent to k = 5 − p conics".
 * Unknowns: the conic u = (a, b, c, d, e, f) (indices 0..5), then for each given conic i the tangency point's two
 * chart coordinates (sᵢ, rᵢ) at 6 + 2i, 7 + 2i. Equations: row 0 the chart of u, rows 1..p the point conditions,
 * then three rows per given conic (on the given conic, on u, parallel gradients). Parameters (packed complex):
 * the p points as (x, y), then the k conics as six coefficients each. Chart constants (packed complex): the chart
 * form ℓ of u (6), then per given conic the origin o, directions v, w and normal m of its point chart (12).
 */
export interface TangencyShape {
  readonly points: number;
  readonly conics: number;
}

/** Number of complex unknowns (= equations): 6 + 2k. */
export function unknownCount(shape: TangencyShape): number {
  return contactIndex(shape.conics);
}

/** Number of complex parameters: 2p + 6k. */
export function parameterCount(shape: TangencyShape): number {
  return 2 * shape.points + 6 * shape.conics;
}

/** Number of complex chart constants: 6 + 12k. */
export function chartCount(shape: TangencyShape): number {
  return chartIndex(shape.conics);
}

/** Complex index of the chart constants of given conic i (origin o, directions v, w, normal m: 3 each). */
export function chartIndex(i: number): number {
  return 6 + 12 * i;
}

/** Complex index of the unknown sᵢ of given conic i's tangency point (rᵢ follows it). */
export function contactIndex(i: number): number {
  return 6 + 2 * i;
}

/** Complex index of the first coefficient of given conic i among the parameters (after the p points). */
export function givenConicIndex(shape: TangencyShape, i: number): number {
  return 2 * shape.points + 6 * i;
}

/** The first of the three equation rows of given conic i (after the chart row and the p point rows). */
export function tangencyRow(shape: TangencyShape, i: number): number {
  return 1 + shape.points + 3 * i;
}

/** Checks p + k = 5 with non-negative integers; throws naming the fault. */
export function checkShape(shape: TangencyShape): void {
  const { points, conics } = shape;
  if (!Number.isInteger(points) || !Number.isInteger(conics) || points < 0 || conics < 0 || points + conics !== 5) {
    throw new RangeError(`conic tangency problem: need points + conics = 5 with non-negative integers, got ${points} + ${conics}`);
  }
}

/** The Jacobian's block structure: u is shared; each tangency point is a private block of 2 unknowns and 3 equations. */
export function tangencyArrowhead(shape: TangencyShape): ArrowheadLayout {
  checkShape(shape);
  const p = shape.points;
  return {
    n: unknownCount(shape),
    shared: [0, 1, 2, 3, 4, 5],
    border: Array.from({ length: 1 + p }, (_, i) => i),
    blocks: Array.from({ length: shape.conics }, (_, i) => {
      const row = tangencyRow(shape, i);
      return { unknowns: [contactIndex(i), contactIndex(i) + 1], equations: [row, row + 1, row + 2] };
    }),
  };
}

/** The tangency point of block i, P = o + s·v + r·w, written to out[oo..oo+5]. */
export function pointOf(chart: Float64Array, i: number, x: Float64Array, out: Float64Array, oo: number): void {
  const co = 2 * chartIndex(i), so = 2 * contactIndex(i);
  const sr = x[so]!, si = x[so + 1]!, rr = x[so + 2]!, ri = x[so + 3]!;
  for (let c = 0; c < 6; c += 2) {
    const vr = chart[co + 6 + c]!, vi = chart[co + 7 + c]!, wr = chart[co + 12 + c]!, wi = chart[co + 13 + c]!;
    out[oo + c] = chart[co + c]! + sr * vr - si * vi + rr * wr - ri * wi;
    out[oo + c + 1] = chart[co + c + 1]! + sr * vi + si * vr + rr * wi + ri * wr;
  }
}
