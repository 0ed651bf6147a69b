import type { CompiledEquations } from '../compile/compile-system.ts';
import { compileMagnitudes } from '../compile/magnitude.ts';
import { createDenseLU } from '../linalg/dense-lu.ts';
import { noScaling, type SystemScaling } from '../start/scaling.ts';

/**
 * Scale-free measures and Newton's method for a square compiled system F(·; parameters) at fixed parameters, in the
 * system's natural units (x = 2^c ⊙ y, equation i scaled by 2^{r_i}; see coefficientScaling). Points are always
 * passed in the original unknowns x. Buffers are made once.
 */
export interface AffineTools {
  /**
   * The backward error η(x) = max_i |f_i(x)| / |f_i|(ξ): each equation's value against the sum of its terms' moduli
   * (see compile/magnitude.ts; for a polynomial, Σ_α |c_α|·ξ^α) at ξ_j = max(|x_j|, 2⁻²⁶·2^c_j·s), s = max(1, ‖y‖∞)
   * in natural units: the componentwise backward error, with coordinates below half the digits of the point's size
   * counted at that size (a coordinate that is zero at a solution is computed as rounding noise). Scale-free
   * (unchanged by rescaling unknowns or equations), 0 at exact solutions, about 2⁻⁵² times the graph's depth at
   * rounded ones, and near 1/s at points near infinity that only the highest-degree terms nearly solve.
   */
  residual(x: Float64Array): number;
  /** κ₁ estimate of the Jacobian in natural units, diag(2^r)·∂F/∂x·diag(2^c) (Infinity when singular or not finite). */
  condition(x: Float64Array): number;
  /** ‖y − y'‖∞ / (1 + max(‖y‖∞, ‖y'‖∞)) in natural units (y = x / 2^c): a scale-free relative distance, symmetric. */
  distance(x: Float64Array, other: Float64Array): number;
  /**
   * Newton's method in place until a correction is ≤ tol in the sense of `distance`; stops (false) after
   * maxIterations, or when a correction fails to halve, restoring the iterate of least backward error. true when converged.
   */
  newton(x: Float64Array, tol: number, maxIterations: number): boolean;
}

/** Coordinates below this fraction of the point's size (natural units) count at that size in the backward error (√(2⁻⁵²)). */
const NOISE_FLOOR = 2 ** -26;

/** Creates AffineTools for F(·; parameters) in the given natural units (default: none). */
export function createAffineTools(compiled: CompiledEquations, parameters: Float64Array, scaling: SystemScaling = noScaling(compiled.n, compiled.neq)): AffineTools {
  const { n, neq } = compiled;
  const units = Float64Array.from(scaling.variables, (c) => 2 ** c);
  const rows = Float64Array.from(scaling.equations, (r) => 2 ** r);
  const magnitudes = compiled.program ? compileMagnitudes(compiled) : null;
  const v = new Float64Array(2 * neq), m = new Float64Array(neq), floored = new Float64Array(2 * n), jac = new Float64Array(2 * neq * n), dx = new Float64Array(2 * n), best = new Float64Array(2 * n);
  const lu = createDenseLU(n);
  const residual = (x: Float64Array): number => {
    compiled.evaluate(x, parameters, v, null, null);
    if (!magnitudes) return relativeSize(v, x, units);
    let radius = 1;
    for (let j = 0; j < n; j++) radius = Math.max(radius, Math.hypot(x[2 * j]!, x[2 * j + 1]!) / units[j]!);
    for (let j = 0; j < n; j++) floored[2 * j] = Math.max(Math.hypot(x[2 * j]!, x[2 * j + 1]!), NOISE_FLOOR * units[j]! * radius);
    magnitudes(floored, parameters, m);
    let eta = 0;
    for (let i = 0; i < neq; i++) {
      const f = Math.hypot(v[2 * i]!, v[2 * i + 1]!);
      const e = f === 0 ? 0 : f / m[i]!;
      if (!(e <= eta)) eta = e; // NaN propagates
    }
    return eta;
  };
  const distance = (x: Float64Array, other: Float64Array): number => {
    let d = 0, s = 0;
    for (let j = 0; j < n; j++) {
      const u = units[j]!;
      const a = Math.hypot(x[2 * j]! - other[2 * j]!, x[2 * j + 1]! - other[2 * j + 1]!) / u;
      const b = Math.max(Math.hypot(x[2 * j]!, x[2 * j + 1]!), Math.hypot(other[2 * j]!, other[2 * j + 1]!)) / u;
      if (!(a <= d)) d = a;
      if (b > s) s = b;
    }
    return d / (1 + s);
  };
  const step = (x: Float64Array): number => {
    let d = 0, s = 0;
    for (let j = 0; j < n; j++) {
      const u = units[j]!;
      const a = Math.hypot(dx[2 * j]!, dx[2 * j + 1]!) / u, b = Math.hypot(x[2 * j]!, x[2 * j + 1]!) / u;
      if (!(a <= d)) d = a;
      if (b > s) s = b;
    }
    return d / (1 + s);
  };
  return {
    residual,
    distance,
    condition(x) {
      compiled.evaluate(x, parameters, v, jac, null);
      for (let i = 0; i < neq; i++) for (let j = 0; j < n; j++) {
        const f = rows[i]! * units[j]!, k = 2 * (i * n + j);
        jac[k]! *= f;
        jac[k + 1]! *= f;
      }
      return lu.factor(jac);
    },
    newton(x, tol, maxIterations) {
      let previous = Infinity;
      best.set(x);
      let bestResidual = residual(x);
      for (let it = 0; it < maxIterations; it++) {
        compiled.evaluate(x, parameters, v, jac, null);
        if (!Number.isFinite(lu.factor(jac))) break;
        lu.solve(v, dx);
        const delta = step(x);
        if (!(delta === delta) || (it > 0 && delta > 0.5 * previous && delta > tol)) break;
        for (let i = 0; i < 2 * n; i++) x[i] = x[i]! - dx[i]!;
        const r = residual(x);
        if (r <= bestResidual) { bestResidual = r; best.set(x); }
        if (delta <= tol) return true;
        previous = delta;
      }
      x.set(best);
      return false;
    },
  };
}

/** Fallback without magnitudes (a system rebuilt from source): ‖F(x)‖∞ / (1 + ‖y‖∞) with y in natural units. */
function relativeSize(v: Float64Array, x: Float64Array, units: Float64Array): number {
  let f = 0, s = 0;
  for (let i = 0; i < v.length; i += 2) f = Math.max(f, Math.hypot(v[i]!, v[i + 1]!));
  for (let j = 0; j < units.length; j++) s = Math.max(s, Math.hypot(x[2 * j]!, x[2 * j + 1]!) / units[j]!);
  return f / (1 + s);
}
