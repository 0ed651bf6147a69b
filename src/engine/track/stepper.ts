import type { FailureReason, Homotopy, LinearSolver } from '../homotopy.ts';
import { createDenseLU } from '../linalg/dense-lu.ts';
import { allFinite, normInf } from '../complex/packed.ts';
import type { TrackerSettings } from './settings.ts';

/** Outcome of tracking one segment: 'ok', a failure reason, or 'ill-conditioned' (aborted at the condition limit). */
export type SegmentStatus = 'ok' | FailureReason | 'ill-conditioned';

/**
 * The predictor–corrector core over one homotopy: buffers made once, nothing allocated per step.
 * `segment` moves x in place along the straight complex segment t = a + τ(b − a), τ: 0 → 1, with a classical
 * RK4 predictor on dx/dτ = −(∂H/∂x)⁻¹·∂H/∂t·(b − a) and a Newton corrector that must contract (each correction
 * ≤ contraction × the previous, the first ≤ maxFirstCorrection), or the step is refused and halved.
 * `newton` polishes x at a fixed t. Counters `steps`, `rejected` accumulate until reset by the caller.
 */
export interface Stepper {
  readonly n: number;
  steps: number;
  rejected: number;
  /** Step |Δt| carried from segment to segment; reset it to start a path. */
  stepSize: number;
  /** Condition estimate of ∂H/∂x at the last factorisation (0 when not estimated: inside segments without a condition limit). */
  condition: number;
  settings: TrackerSettings;
  /** Tracks x in place from t = a to t = b; aborts with 'ill-conditioned' above conditionLimit and with 'step-budget' after attemptLimit attempts in this segment. */
  segment(x: Float64Array, aRe: number, aIm: number, bRe: number, bIm: number, conditionLimit?: number, attemptLimit?: number): SegmentStatus;
  /** Newton at t until a correction ≤ tol (true) or maxIterations pass / it stops contracting (false). */
  newton(x: Float64Array, tRe: number, tIm: number, tol: number, maxIterations: number): boolean;
  /** ‖H(x, t)‖∞ / (1 + ‖x‖∞) (also leaves ∂H/∂x factored and `condition` set). */
  residual(x: Float64Array, tRe: number, tIm: number): number;
}

/** Creates a stepper for the homotopy with the given settings (the solver from homotopy.createSolver, else dense LU). */
export function createStepper(homotopy: Homotopy, settings: TrackerSettings): Stepper {
  const n = homotopy.n, len = 2 * n;
  const solver: LinearSolver = homotopy.createSolver?.() ?? createDenseLU(n);
  const h = new Float64Array(len), jac = new Float64Array(len * n), ht = new Float64Array(len);
  const k1 = new Float64Array(len), k2 = new Float64Array(len), k3 = new Float64Array(len), k4 = new Float64Array(len);
  const xs = new Float64Array(len), xp = new Float64Array(len), dx = new Float64Array(len);

  const self: Stepper = { n, steps: 0, rejected: 0, stepSize: settings.maxStep / 2, condition: 1, settings, segment, newton, residual };
  const extended = homotopy.evaluateValueExtended?.bind(homotopy);
  /** Evaluates H, ∂H/∂x and ∂H/∂t at (z, t) for a Newton correction: in extended precision, H is replaced by its double-double value. */
  function evaluateForCorrection(z: Float64Array, tRe: number, tIm: number): void {
    homotopy.evaluate(z, tRe, tIm, h, jac, ht);
    if (extended && self.settings.precision === 'double-double') extended(z, tRe, tIm, h);
  }

  let wantCondition = true;
  /** Factors jac; sets `condition` (0 = not estimated: the solver's factorOnly was used); false when singular. */
  function factorJacobian(): boolean {
    if (!wantCondition && solver.factorOnly) {
      const ok = solver.factorOnly(jac);
      self.condition = ok ? 0 : Infinity;
      return ok;
    }
    self.condition = solver.factor(jac);
    return Number.isFinite(self.condition);
  }

  /** out = −(∂H/∂x)⁻¹ ∂H/∂t · d at (z, t); false when the Jacobian is singular or values are not finite. */
  function tangent(z: Float64Array, tRe: number, tIm: number, dRe: number, dIm: number, out: Float64Array): boolean {
    homotopy.evaluate(z, tRe, tIm, h, jac, ht);
    if (!factorJacobian()) return false;
    solver.solve(ht, out);
    return scaleTangent(out, dRe, dIm);
  }
  function scaleTangent(out: Float64Array, dRe: number, dIm: number): boolean {
    for (let i = 0; i < len; i += 2) {
      const r = out[i]!, m = out[i + 1]!;
      out[i] = -(r * dRe - m * dIm);
      out[i + 1] = -(r * dIm + m * dRe);
      if (!Number.isFinite(out[i]!) || !Number.isFinite(out[i + 1]!)) return false;
    }
    return true;
  }
  function stage(out: Float64Array, base: Float64Array, k: Float64Array, c: number): void {
    for (let i = 0; i < len; i++) out[i] = base[i]! + c * k[i]!;
  }

  function segment(x: Float64Array, aRe: number, aIm: number, bRe: number, bIm: number, conditionLimit = Infinity, attemptLimit = Infinity): SegmentStatus {
    const s = self.settings;
    const dRe = bRe - aRe, dIm = bIm - aIm, length = Math.hypot(dRe, dIm);
    if (length === 0) return 'ok';
    let tau = 0;
    let have1 = false;
    const budget = Math.min(s.maxSteps, self.steps + self.rejected + attemptLimit);
    wantCondition = conditionLimit < Infinity;
    while (tau < 1) {
      if (self.steps + self.rejected >= budget) return 'step-budget';
      const hMax = s.maxStep / length;
      let hh = Math.min(self.stepSize / length, hMax, 1 - tau);
      const last = hh >= 1 - tau;
      if (last) hh = 1 - tau;
      if (!have1) {
        if (!tangent(x, aRe + tau * dRe, aIm + tau * dIm, dRe, dIm, k1)) return allFinite(x, len) ? 'no-convergence' : 'non-finite';
        if (self.condition > conditionLimit) return 'ill-conditioned';
        have1 = true;
      }
      const tm = tau + hh / 2, t1 = last ? 1 : tau + hh;
      stage(xs, x, k1, hh / 2);
      let ok = tangent(xs, aRe + tm * dRe, aIm + tm * dIm, dRe, dIm, k2);
      if (ok) { stage(xs, x, k2, hh / 2); ok = tangent(xs, aRe + tm * dRe, aIm + tm * dIm, dRe, dIm, k3); }
      if (ok) { stage(xs, x, k3, hh); ok = tangent(xs, aRe + t1 * dRe, aIm + t1 * dIm, dRe, dIm, k4); }
      let first = Infinity;
      if (ok) {
        for (let i = 0; i < len; i++) xp[i] = x[i]! + (hh / 6) * (k1[i]! + 2 * k2[i]! + 2 * k3[i]! + k4[i]!);
        first = correct(aRe + t1 * dRe, aIm + t1 * dIm, dRe, dIm);
      }
      if (first >= 0) {
        // accepted: k1 now holds the tangent at the new point (from the corrector's last factorisation)
        for (let i = 0; i < len; i++) x[i] = xp[i]!;
        tau = t1;
        self.steps++;
        const grow = first > 0 ? 0.9 * Math.pow(s.predictorTolerance / first, 0.2) : 2;
        self.stepSize = Math.min(s.maxStep, hh * length * Math.min(2, Math.max(0.5, grow)));
        if (self.condition > conditionLimit) return 'ill-conditioned';
      } else {
        self.rejected++;
        const shrink = Number.isFinite(-first) && -first > 0 ? 0.9 * Math.pow(s.predictorTolerance / -first, 0.2) : 0.5;
        self.stepSize = hh * length * Math.min(0.5, Math.max(0.1, shrink));
        have1 = true;
        if (self.stepSize < s.minStep * length) return 'step-underflow';
      }
    }
    return 'ok';
  }

  /**
   * Newton from xp at t; returns the first correction (≥ 0) when it converged and contracted, and leaves the
   * tangent at the last iterate in k1; returns −(first correction) or −Infinity when the step must be refused.
   */
  function correct(tRe: number, tIm: number, dRe: number, dIm: number): number {
    const s = self.settings;
    let previous = Infinity, first = -1;
    for (let it = 0; it < s.maxCorrectorIterations; it++) {
      evaluateForCorrection(xp, tRe, tIm);
      if (!factorJacobian()) return -Infinity;
      solver.solve(h, dx);
      const delta = normInf(dx) / (1 + normInf(xp));
      if (!(delta === delta)) return -Infinity;
      if (it === 0) {
        first = delta;
        if (delta > s.maxFirstCorrection) return -delta;
      } else if (delta > s.correctorTolerance && delta > s.contraction * previous) {
        return -first;
      }
      for (let i = 0; i < len; i++) xp[i] = xp[i]! - dx[i]!;
      const theta = delta / previous;
      previous = delta;
      if (delta <= s.correctorTolerance || (s.estimateCorrectorError === true && it === 1 && theta <= 0.01 && (theta / (1 - theta)) * delta <= s.correctorTolerance)) {
        solver.solve(ht, k1);
        return scaleTangent(k1, dRe, dIm) ? first : -Infinity;
      }
    }
    return -first;
  }

  function newton(x: Float64Array, tRe: number, tIm: number, tol: number, maxIterations: number): boolean {
    let previous = Infinity;
    for (let it = 0; it < maxIterations; it++) {
      evaluateForCorrection(x, tRe, tIm);
      self.condition = solver.factor(jac);
      if (!Number.isFinite(self.condition)) return false;
      solver.solve(h, dx);
      const delta = normInf(dx) / (1 + normInf(x));
      if (!(delta === delta)) return false;
      if (it > 0 && delta > tol && delta > 0.5 * previous) return false;
      for (let i = 0; i < len; i++) x[i] = x[i]! - dx[i]!;
      if (delta <= tol) return true;
      previous = delta;
    }
    return false;
  }

  function residual(x: Float64Array, tRe: number, tIm: number): number {
    evaluateForCorrection(x, tRe, tIm);
    self.condition = solver.factor(jac);
    return normInf(h) / (1 + normInf(x));
  }

  return self;
}
