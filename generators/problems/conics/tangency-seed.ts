import { createDenseLU, dotu, type RandomSource } from '../../../src/engine/index.ts';
import { coefficientGradient, conicTimesPoint, cross3, dot3 } from './conic-kernels.ts';
import { chartCount, chartIndex, checkShape, contactIndex, givenConicIndex, parameterCount, pointOf, unknownCount, type TangencyShape } from './tangency-layout.ts';

/** Solves the dense complex n×n system A·x = b (packed) by LU with partial pivoting; throws when singular. */
function solveDense(n: number, A: Float64Array, b: Float64Array): Float64Array {
  const solver = createDenseLU(n);
  if (!Number.isFinite(solver.factor(A))) throw new Error('tangency seed: singular linear system (draw another seed)');
  const x = new Float64Array(2 * n);
  solver.solve(b, x);
  return x;
}

/**
 * Random chart constants (packed complex, layout of tangency-layout.ts): a Gaussian chart form ℓ for u, and per given
 * conic a random normal m with directions v = m × r₁, w = m × r₂ (so m·v = m·w = 0) and origin o = r₃ / (m·r₃).
 */
export function randomChart(shape: TangencyShape, random: RandomSource): Float64Array {
  checkShape(shape);
  const chart = new Float64Array(2 * chartCount(shape));
  for (let j = 0; j < 6; j++) random.gaussianComplex(chart, 2 * j);
  const r = new Float64Array(18), md = new Float64Array(2);
  for (let i = 0; i < shape.conics; i++) {
    const co = 2 * chartIndex(i);
    for (let j = 0; j < 9; j++) random.gaussianComplex(r, 2 * j);
    for (let j = 0; j < 3; j++) random.gaussianComplex(chart, co + 18 + 2 * j);
    cross3(chart, co + 18, r, 0, chart, co + 6);
    cross3(chart, co + 18, r, 6, chart, co + 12);
    dot3(chart, co + 18, r, 12, md, 0);
    const dr = md[0]!, di = md[1]!, d = dr * dr + di * di;
    for (let j = 0; j < 3; j++) {
      const xr = r[12 + 2 * j]!, xi = r[13 + 2 * j]!;
      chart[co + 2 * j] = (xr * dr + xi * di) / d;
      chart[co + 2 * j + 1] = (xi * dr - xr * di) / d;
    }
  }
  return chart;
}

/**
 * A start pair built solution-first: random chart coordinates of the tangency points and random points (x, y, 1);
 * u is the conic through all five points with ℓ·u = 1; each given conic is a random member of the 4-dimensional
 * space of conics through its tangency point with gradient parallel to u's there. Residual ≈ machine precision.
 */
export function tangencySeed(shape: TangencyShape, chart: Float64Array, random: RandomSource): { parameters: Float64Array; solution: Float64Array } {
  checkShape(shape);
  const n = unknownCount(shape), x = new Float64Array(2 * n), parameters = new Float64Array(2 * parameterCount(shape));
  const pts = new Float64Array(30); // five points of P², packed complex
  for (let j = 0; j < shape.points; j++) {
    random.gaussianComplex(parameters, 4 * j);
    random.gaussianComplex(parameters, 4 * j + 2);
    pts.set([parameters[4 * j]!, parameters[4 * j + 1]!, parameters[4 * j + 2]!, parameters[4 * j + 3]!, 1, 0], 6 * j);
  }
  for (let i = 0; i < shape.conics; i++) {
    random.gaussianComplex(x, 2 * contactIndex(i));
    random.gaussianComplex(x, 2 * (contactIndex(i) + 1));
    pointOf(chart, i, x, pts, 6 * (shape.points + i));
  }
  // u: the five point conditions and the chart row.
  const M = new Float64Array(72), rhs = new Float64Array(12), grad = new Float64Array(12);
  M.set(chart.subarray(0, 12), 0);
  rhs[0] = 1;
  for (let j = 0; j < 5; j++) {
    coefficientGradient(pts, 6 * j, pts, 6 * j, grad, 0);
    M.set(grad, 12 * (j + 1));
  }
  x.set(solveDense(6, M, rhs), 0);
  // Each given conic: random R minus its bilinear projection onto the two condition rows.
  const UP = new Float64Array(6), hv = new Float64Array(6), G = new Float64Array(24), R = new Float64Array(12);
  for (let i = 0; i < shape.conics; i++) {
    const po = 6 * (shape.points + i), co = 2 * chartIndex(i);
    conicTimesPoint(x, 0, pts, po, UP, 0);
    cross3(UP, 0, chart, co + 18, hv, 0);
    coefficientGradient(pts, po, pts, po, G, 0);
    coefficientGradient(hv, 0, pts, po, G, 12);
    for (let j = 0; j < 6; j++) random.gaussianComplex(R, 2 * j);
    const gram = new Float64Array(8), gr = new Float64Array(4);
    for (let a = 0; a < 2; a++) {
      dotu(gr, G, R, 6, 12 * a, 0, 2 * a);
      for (let b = 0; b < 2; b++) dotu(gram, G, G, 6, 12 * a, 12 * b, 2 * (2 * a + b));
    }
    const coef = solveDense(2, gram, gr);
    const out = 2 * givenConicIndex(shape, i);
    for (let j = 0; j < 6; j++) {
      let re = R[2 * j]!, im = R[2 * j + 1]!;
      for (let a = 0; a < 2; a++) {
        const cr = coef[2 * a]!, ci = coef[2 * a + 1]!, gr0 = G[12 * a + 2 * j]!, gi0 = G[12 * a + 2 * j + 1]!;
        re -= cr * gr0 - ci * gi0;
        im -= cr * gi0 + ci * gr0;
      }
      parameters[out + 2 * j] = re;
      parameters[out + 2 * j + 1] = im;
    }
  }
  return { parameters, solution: x };
}
