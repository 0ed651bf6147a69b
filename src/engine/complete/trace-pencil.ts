import * as ops from '../expr/build.ts';
import type { ExprNode, PolynomialSystem } from '../expr/node.ts';
import { compileSystem, type CompiledEquations } from '../compile/compile-system.ts';
import { multihomogenize } from '../start/homogenize.ts';
import type { RandomSource } from '../random.ts';

/** Which linear form a cuts the curve with: x_k − κ·h (random k, κ) or a random form in all of X = (x, h). */
export type PencilHyperplane = 'coordinate' | 'generic';

/**
 * The curve of a parameter line and the pencil φ = s·(a·X) on it, ready to track (see trace-test.ts for the theory).
 * Unknowns Z = (X₀ … X_{n−1}, h, s) (n + 2), one parameter λ; equations F̂(X; p₀ + s·v) (each homogenised in X to
 * its degree in x), b·X − 1, s·(a·X) − λ.
 */
export interface TracePencil {
  /** G as a graph (unknowns X, h, s; parameter λ) and compiled. */
  readonly system: PolynomialSystem;
  readonly compiled: CompiledEquations;
  /** The original system's unknowns. */
  readonly n: number;
  /** Z at λ = 0 for an affine solution x at p₀: X = (x, 1)/b·(x, 1), s = 0 (a new array). */
  lift(x: Float64Array): Float64Array;
  /** Adds c·X at z to out[0], out[1]. */
  addTraced(z: Float64Array, out: Float64Array): void;
  /** |a·X| / ‖X‖∞ at z: small on the hyperplane part of the fibre at λ = 0. */
  hyperplaneDistance(z: Float64Array): number;
  /** The random choices (packed complex), for the record: v (m), b, c, a (n + 1 each). */
  readonly choices: { readonly direction: Float64Array; readonly chart: Float64Array; readonly traced: Float64Array; readonly hyperplane: Float64Array };
}

/**
 * Builds the pencil for `system` (square, n unknowns, m ≥ 1 parameters) at `parameters` = p₀ with random v, b, c
 * and a drawn from `random` in that order (v Gaussian scaled by max(1, ‖p₀‖∞); b the best of CHART_DRAWS Gaussian
 * draws for the given solutions, see bestChart; c Gaussian; a by `hyperplane`).
 * Everything but λ is baked into the graph as constants, so the compiled system has one parameter.
 */
export function createTracePencil(system: PolynomialSystem, parameters: Float64Array, solutions: readonly Float64Array[], random: RandomSource, hyperplane: PencilHyperplane, moving?: readonly number[]): TracePencil {
  const n = system.unknowns.length, m = system.parameters.length;
  if (system.equations.length !== n) throw new RangeError(`trace pencil: needs a square system, got ${system.equations.length} equations in ${n} unknowns`);
  if (parameters.length !== 2 * m) throw new RangeError(`trace pencil: parameters have length ${parameters.length}, expected ${2 * m}`);
  let scale = 1;
  for (let j = 0; j < 2 * m; j++) scale = Math.max(scale, Math.abs(parameters[j]!));
  const direction = gaussian(m, random, scale);
  if (moving) for (let j = 0; j < m; j++) if (!moving.includes(j)) { direction[2 * j] = 0; direction[2 * j + 1] = 0; }
  const chart = bestChart(n, solutions, random), traced = gaussian(n + 1, random);
  const form = hyperplane === 'generic' ? gaussian(n + 1, random) : coordinateForm(n, random);
  const X = [...Array.from({ length: n }, (_, i) => ops.unknown(system.unknowns[i]!, i)), ops.unknown('h', n)];
  const s = ops.unknown('s', n + 1), lambda = ops.param('lambda', 0);
  const constants = (v: Float64Array): ExprNode[] => Array.from({ length: v.length / 2 }, (_, j) => ops.constant(v[2 * j]!, v[2 * j + 1]!));
  const along = (node: ExprNode & { kind: 'param' }): ExprNode =>
    ops.add(ops.constant(parameters[2 * node.index]!, parameters[2 * node.index + 1]!), ops.mul(s, ops.constant(direction[2 * node.index]!, direction[2 * node.index + 1]!)));
  const equations = [
    ...multihomogenize(system.equations, [Array.from({ length: n }, (_, i) => i)], n, along),
    ops.sub(ops.dot(constants(chart), X), 1),
    ops.sub(ops.mul(s, ops.dot(constants(form), X)), lambda),
  ];
  const pencilSystem: PolynomialSystem = { unknowns: [...system.unknowns, 'h', 's'], parameters: ['lambda'], equations };
  const compiled = compileSystem(pencilSystem);
  const linear = (w: Float64Array, z: Float64Array, out: Float64Array): void => {
    let re = 0, im = 0;
    for (let i = 0; i <= n; i++) {
      const wr = w[2 * i]!, wi = w[2 * i + 1]!, zr = z[2 * i]!, zi = z[2 * i + 1]!;
      re += wr * zr - wi * zi; im += wr * zi + wi * zr;
    }
    out[0] = re; out[1] = im;
  };
  const tmp = new Float64Array(2);
  return {
    system: pencilSystem,
    compiled,
    n,
    lift(x) {
      const z = new Float64Array(2 * (n + 2));
      z.set(x.subarray(0, 2 * n));
      z[2 * n] = 1;
      linear(chart, z, tmp);
      const d = tmp[0]! * tmp[0]! + tmp[1]! * tmp[1]!, ir = tmp[0]! / d, ii = -tmp[1]! / d;
      for (let i = 0; i <= n; i++) {
        const zr = z[2 * i]!, zi = z[2 * i + 1]!;
        z[2 * i] = zr * ir - zi * ii; z[2 * i + 1] = zr * ii + zi * ir;
      }
      return z;
    },
    addTraced(z, out) { linear(traced, z, tmp); out[0] = out[0]! + tmp[0]!; out[1] = out[1]! + tmp[1]!; },
    hyperplaneDistance(z) {
      linear(form, z, tmp);
      let big = 0;
      for (let i = 0; i <= n; i++) big = Math.max(big, Math.hypot(z[2 * i]!, z[2 * i + 1]!));
      return Math.hypot(tmp[0]!, tmp[1]!) / big;
    },
    choices: { direction, chart, traced, hyperplane: form },
  };
}

/** Gaussian charts drawn to choose from. */
const CHART_DRAWS = 8;

/**
 * The Gaussian b (of CHART_DRAWS draws) that keeps the lifted solutions X = (x, 1)/b·(x, 1) smallest: largest
 * min |b·(x, 1)| / (‖b‖₂ ‖(x, 1)‖₂) over the solutions. A lift with |b·(x, 1)| tiny has huge coordinates and an
 * ill-scaled Jacobian (measured: condition 1e10 at |X| ≈ 400 on two conics, which the tracker calls singular).
 */
function bestChart(n: number, solutions: readonly Float64Array[], random: RandomSource): Float64Array {
  let best = gaussian(n + 1, random), bestScore = -1;
  for (let k = 0; k < CHART_DRAWS; k++) {
    const b = k === 0 ? best : gaussian(n + 1, random);
    let bb = 0;
    for (let i = 0; i < 2 * (n + 1); i++) bb += b[i]! * b[i]!;
    let score = Infinity;
    for (const x of solutions) {
      let re = b[2 * n]!, im = b[2 * n + 1]!, xx = 1;
      for (let i = 0; i < n; i++) {
        const br = b[2 * i]!, bi = b[2 * i + 1]!, xr = x[2 * i]!, xi = x[2 * i + 1]!;
        re += br * xr - bi * xi; im += br * xi + bi * xr; xx += xr * xr + xi * xi;
      }
      score = Math.min(score, Math.hypot(re, im) / Math.sqrt(bb * xx));
    }
    if (score > bestScore) { best = b; bestScore = score; }
  }
  return best;
}

function gaussian(count: number, random: RandomSource, scale = 1): Float64Array {
  const v = new Float64Array(2 * count);
  for (let j = 0; j < count; j++) random.gaussianComplex(v, 2 * j);
  for (let j = 0; j < 2 * count; j++) v[j] = v[j]! * scale;
  return v;
}

/** The form x_k − κ·h for a uniformly random k < n and a Gaussian κ. */
function coordinateForm(n: number, random: RandomSource): Float64Array {
  const k = Math.min(n - 1, Math.floor(random.next() * n));
  const form = new Float64Array(2 * (n + 1));
  form[2 * k] = 1;
  random.gaussianComplex(form, 2 * n);
  form[2 * n] = -form[2 * n]!; form[2 * n + 1] = -form[2 * n + 1]!;
  return form;
}
