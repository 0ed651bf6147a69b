import type { CompiledEquations } from '../compile/compile-system.ts';
import { createDenseLU } from '../linalg/dense-lu.ts';
import { createRandom } from '../random.ts';
import type { SystemScaling } from '../start/scaling.ts';
import type { AffineTools } from './affine.ts';

/** What the nearby samples say of a point of F = 0: on a positive-dimensional set, isolated, or not decided. */
export type LocalDimension = 'positive' | 'isolated' | 'undecided';

/** Relative offset (natural units) of the nearby samples from the point. */
const OFFSET = 1e-3;
/** Damped Gauss–Newton iterations per sample (at most; a sample stops when its step is below 2⁻⁵² relative). */
const ITERATIONS = 200;
/**
 * A sample that settled on F = 0 has backward error at most this, and at most NEAR_INFINITY_MARGIN / (1 + ‖y‖∞) in
 * natural units: on a set, however non-reduced, Gauss–Newton gets to 1e-16 – 1e-11 within its iterations; a stop
 * away from F = 0 leaves 1e-4 and more, and a stop near infinity, where only the highest-degree terms nearly cancel,
 * leaves about 1/‖y‖ — the margin keeps samples a million times below that…
 */
const ON_SOLUTION_SET = 1e-9;
const NEAR_INFINITY_MARGIN = 1e-6;
/**
 * …and its last step at most this fraction of its distance from the point: it stopped there. Creeping back toward an
 * isolated point of multiplicity μ, Gauss–Newton's steps are about 1/μ of the remaining distance.
 */
const SETTLED_STEP = 1e-3;
/** A settled sample farther than this fraction of the offset from the point found a neighbour on the same set. */
const FAR = 0.1;
/** A sample that came back within this fraction of the offset found the point isolated. */
const BACK = 1e-3;
/** Ridge of the damped normal equations, relative to the largest diagonal entry of JᴴJ. */
const RIDGE = 1e-14;

/**
 * A numerical local-dimension test by nearby samples, for a point x* where F is numerically singular. From
 * x* + 10⁻³·(1 + ‖y*‖)·w (w a random complex unit direction in natural units), damped Gauss–Newton (Levenberg,
 * Quart. Appl. Math. 2, 1944; Marquardt, SIAM J. Appl. Math. 11, 1963: Δ = −(JᴴJ + μI)⁻¹JᴴF in natural units,
 * μ = 10⁻¹⁴·max diag JᴴJ) runs ≤ 200 iterations. Near an isolated point, however singular, the only zero in reach is
 * x* itself and the iterates creep back to it; near a positive-dimensional set (reduced or not) they settle on the
 * set at a distance comparable to the offset. 'positive' when some sample (of two) settled — backward error ≤ min(1e-9, 1e-6/(1 + ‖y‖))
 * and last step ≤ 10⁻³ of its distance from x* — more than a tenth of the offset away from x*; 'isolated' when both came back
 * within 10⁻³ of the offset; 'undecided' otherwise. Deterministic for a seed. Buffers are made once per test.
 */
export function createLocalDimensionTest(compiled: CompiledEquations, parameters: Float64Array, scaling: SystemScaling, tools: AffineTools): (x: Float64Array, seed: number) => LocalDimension {
  const { n, neq } = compiled;
  const units = Float64Array.from(scaling.variables, (c) => 2 ** c);
  const rows = Float64Array.from(scaling.equations, (r) => 2 ** r);
  const v = new Float64Array(2 * neq), jac = new Float64Array(2 * neq * n), normal = new Float64Array(2 * n * n), rhs = new Float64Array(2 * n), dy = new Float64Array(2 * n);
  const w = new Float64Array(2 * n), z = new Float64Array(2 * n);
  const lu = createDenseLU(n);

  /** One damped Gauss–Newton step at z (in x units); returns the step's relative size in natural units, NaN on failure. */
  function step(): number {
    compiled.evaluate(z, parameters, v, jac, null);
    for (let i = 0; i < neq; i++) {
      v[2 * i]! *= rows[i]!;
      v[2 * i + 1]! *= rows[i]!;
      for (let j = 0; j < n; j++) {
        const f = rows[i]! * units[j]!, k = 2 * (i * n + j);
        jac[k]! *= f;
        jac[k + 1]! *= f;
      }
    }
    let top = 0;
    for (let a = 0; a < n; a++) {
      let rr = 0, ri = 0;
      for (let i = 0; i < neq; i++) {
        const jr = jac[2 * (i * n + a)]!, ji = -jac[2 * (i * n + a) + 1]!, fr = v[2 * i]!, fi = v[2 * i + 1]!;
        rr += jr * fr - ji * fi;
        ri += jr * fi + ji * fr;
      }
      rhs[2 * a] = rr;
      rhs[2 * a + 1] = ri;
      for (let b = 0; b < n; b++) {
        let sr = 0, si = 0;
        for (let i = 0; i < neq; i++) {
          const ar = jac[2 * (i * n + a)]!, ai = -jac[2 * (i * n + a) + 1]!, br = jac[2 * (i * n + b)]!, bi = jac[2 * (i * n + b) + 1]!;
          sr += ar * br - ai * bi;
          si += ar * bi + ai * br;
        }
        normal[2 * (a * n + b)] = sr;
        normal[2 * (a * n + b) + 1] = si;
        if (a === b && sr > top) top = sr;
      }
    }
    const mu = RIDGE * top;
    for (let a = 0; a < n; a++) normal[2 * (a * n + a)]! += mu;
    if (!Number.isFinite(lu.factor(normal))) return NaN;
    lu.solve(rhs, dy);
    let d = 0, s = 0;
    for (let j = 0; j < n; j++) {
      const u = units[j]!;
      z[2 * j]! -= u * dy[2 * j]!;
      z[2 * j + 1]! -= u * dy[2 * j + 1]!;
      d = Math.max(d, Math.hypot(dy[2 * j]!, dy[2 * j + 1]!));
      s = Math.max(s, Math.hypot(z[2 * j]!, z[2 * j + 1]!) / u);
    }
    return d / (1 + s);
  }

  return (x, seed) => {
    const random = createRandom(seed);
    let scale = 0;
    for (let j = 0; j < n; j++) scale = Math.max(scale, Math.hypot(x[2 * j]!, x[2 * j + 1]!) / units[j]!);
    let back = 0;
    for (let sample = 0; sample < 2; sample++) {
      let norm = 0;
      for (let j = 0; j < n; j++) { random.gaussianComplex(w, 2 * j); norm = Math.max(norm, Math.hypot(w[2 * j]!, w[2 * j + 1]!)); }
      const offset = OFFSET * (1 + scale);
      for (let j = 0; j < n; j++) {
        z[2 * j] = x[2 * j]! + (offset * units[j]! * w[2 * j]!) / norm;
        z[2 * j + 1] = x[2 * j + 1]! + (offset * units[j]! * w[2 * j + 1]!) / norm;
      }
      let last = NaN;
      for (let it = 0; it < ITERATIONS; it++) {
        last = step();
        if (!(last === last) || last <= 2 ** -52) break;
      }
      if (!(last === last)) continue;
      const distance = tools.distance(z, x) * (1 + scale); // back to offset units (‖Δy‖∞)
      const onSet = Math.min(ON_SOLUTION_SET, NEAR_INFINITY_MARGIN / (1 + scale));
      if (tools.residual(z) <= onSet && last <= (SETTLED_STEP * distance) / (1 + scale) && distance > FAR * offset) return 'positive';
      if (distance <= BACK * offset) back++;
    }
    return back === 2 ? 'isolated' : 'undecided';
  };
}
