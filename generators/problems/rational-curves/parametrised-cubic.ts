import type { FormulationDefinition } from '../../../src/atlas/definition.ts';
import type { RandomSource } from '../../../src/engine/index.ts';

const AXES = ['x', 'y', 'z'] as const;
/** The points traced at t = 4 … 8 (points 1, 2, 3 sit at t = 0, 1, ∞). */
export const TRACED = [4, 5, 6, 7, 8] as const;
/** Unknowns: λ (leading coefficient along P₃), μ (value at t = 1 along P₂), the coefficient c₁ of t, and t₄ … t₈. */
export const PARAMETRISED_UNKNOWNS = ['lambda', 'mu', 'c1x', 'c1y', 'c1z', ...TRACED.map((i) => `t${i}`)];
/** Parameters: P₁, P₂, P₃ (homogeneous), then two lines L_{i,1}, L_{i,2} through each traced point i (homogeneous). */
export const PARAMETRISED_PARAMETERS = [
  ...[1, 2, 3].flatMap((i) => AXES.map((a) => `P${i}${a}`)),
  ...TRACED.flatMap((i) => [1, 2].flatMap((m) => AXES.map((a) => `L${i}${m}${a}`))),
];

/**
 * A rational cubic as a map φ(t) = P₁ + c₁t + (μP₂ − P₁ − c₁ − λP₃)t² + λP₃t³, fixed by φ(0) = P₁, φ(1) = μP₂ and
 * φ(∞) ∝ P₃; point i = 4 … 8 (the meet of two lines) lies on it when L_{i,1}·φ(t_i) = L_{i,2}·φ(t_i) = 0. Ten
 * equations of degree 4 (linear in the curve's unknowns, cubic in t_i) in ten unknowns; exact (no numerics).
 */
export const parametrisedCubicFormulation: FormulationDefinition = {
  unknowns: PARAMETRISED_UNKNOWNS,
  parameters: PARAMETRISED_PARAMETERS,
  description: 'A degree-3 map fixed at three of the points; the other five points each add an unknown parameter value.',
  equations: (u, q, ops) => TRACED.flatMap((i) => {
    const t = u[`t${i}`]!;
    const phi = AXES.map((a) => {
      const P1 = q[`P1${a}`]!, P2 = q[`P2${a}`]!, P3 = q[`P3${a}`]!, c1 = u[`c1${a}`]!;
      const c2 = ops.sub(ops.sub(ops.mul(u.mu!, P2), P1), ops.add(c1, ops.mul(u.lambda!, P3)));
      return ops.add(P1, ops.mul(c1, t), ops.mul(c2, ops.pow(t, 2)), ops.mul(u.lambda!, P3, ops.pow(t, 3)));
    });
    return [1, 2].map((m) => ops.dot(AXES.map((a) => q[`L${i}${m}${a}`]!), phi));
  }),
};

type C = [number, number];
const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const add = (...zs: C[]): C => zs.reduce<C>((s, z) => [s[0] + z[0], s[1] + z[1]], [0, 0]);
const div = (a: C, b: C): C => { const d = b[0] * b[0] + b[1] * b[1]; return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d]; };

/** φ(t) of a solution (packed complex unknowns in PARAMETRISED_UNKNOWNS order) for packed complex parameters. */
export function mapPoint(x: Float64Array, p: Float64Array, t: C): C[] {
  const at = (v: Float64Array, k: number): C => [v[2 * k]!, v[2 * k + 1]!];
  const [lambda, mu] = [at(x, 0), at(x, 1)];
  const t2 = mul(t, t), t3 = mul(t2, t);
  return AXES.map((_, a) => {
    const P1 = at(p, a), P2 = at(p, 3 + a), P3 = at(p, 6 + a), c1 = at(x, 2 + a);
    const c2 = add(mul(mu, P2), mul([-1, 0], add(P1, c1, mul(lambda, P3))));
    return add(P1, mul(c1, t), mul(c2, t2), mul(mul(lambda, P3), t3));
  });
}

/**
 * A solution-first seed: a random complex curve (λ, μ, c₁), random parameter values t₄ … t₈ and points P₁, P₂, P₃,
 * then for each traced point two random lines moved (by their third coordinate) to pass through φ(t_i). Returns
 * packed complex parameters and the solution they were built around (residual at rounding level).
 */
export function parametrisedSeed(random: RandomSource): { parameters: Float64Array; solution: Float64Array } {
  const z = (): C => [random.normal(), random.normal()];
  const solution = Float64Array.from(PARAMETRISED_UNKNOWNS.flatMap(() => z()));
  const points = Array.from({ length: 9 }, () => z()).flat();
  const partial = Float64Array.from([...points, ...new Array<number>(2 * 30).fill(0)]);
  const lines: number[] = [];
  TRACED.forEach((_, k) => {
    const q = mapPoint(solution, partial, [solution[2 * (5 + k)]!, solution[2 * (5 + k) + 1]!]);
    for (let m = 0; m < 2; m++) {
      const L = [z(), z(), z()];
      L[2] = div(add(mul(L[0]!, q[0]!), mul(L[1]!, q[1]!)), mul([-1, 0], q[2]!));
      lines.push(...L.flat());
    }
  });
  return { parameters: Float64Array.from([...points, ...lines]), solution };
}
