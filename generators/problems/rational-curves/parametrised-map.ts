import type { FormulationDefinition } from '../../../src/atlas/definition.ts';
import type { ExprNode, RandomSource } from '../../../src/engine/index.ts';
import { addPairs, mulPairs, pairAt, subPairs, divPairs, type ComplexPair } from '../shared/complex-pair.ts';

type Ops = Parameters<FormulationDefinition['equations']>[2];
const AXES = ['x', 'y', 'z'] as const;

/** Points 4 … 3d − 1, the ones traced at unknown parameter values (points 1, 2, 3 sit at t = 0, 1, ∞). */
export function tracedPoints(degree: number): number[] {
  if (!Number.isInteger(degree) || degree < 3) throw new RangeError(`tracedPoints: need an integer degree ≥ 3, got ${degree}`);
  return Array.from({ length: 3 * degree - 4 }, (_, k) => k + 4);
}

/** The free inner coefficients c₁ … c_{d−2} of the map (c_{d−1} follows from φ(1) = μP₂). */
const innerOrders = (degree: number): number[] => Array.from({ length: degree - 2 }, (_, k) => k + 1);

/** Unknowns: λ (leading coefficient along P₃), μ (value at t = 1 along P₂), c₁ … c_{d−2} (x, y, z each), then t₄ … t_{3d−1}. */
export function mapUnknowns(degree: number): string[] {
  return ['lambda', 'mu', ...innerOrders(degree).flatMap((k) => AXES.map((a) => `c${k}${a}`)), ...tracedPoints(degree).map((i) => `t${i}`)];
}

/** Parameters: the affine coordinates px1, py1, …, px(3d−1), py(3d−1) of the 3d − 1 points. */
export function mapParameters(degree: number): string[] {
  return [1, 2, 3, ...tracedPoints(degree)].flatMap((i) => [`px${i}`, `py${i}`]);
}

/**
 * The map's coordinates at t as nodes: φ(t) = αP₁ + Σ_{k<d−1} c_k t^k + c_{d−1} t^{d−1} + λP₃ t^d with P_i = (px_i, py_i, 1)
 * and c_{d−1} = μP₂ − αP₁ − Σ c_k − λP₃, so φ(0) = αP₁, φ(1) = μP₂ and φ(∞) ∝ P₃; α is `scale` (default 1). With `s`,
 * the binary form at (s, t) instead: term k times s^{d−k} (exact).
 */
export function mapAt(degree: number, u: Readonly<Record<string, ExprNode>>, q: Readonly<Record<string, ExprNode>>, ops: Ops, t: ExprNode, scale?: ExprNode, s?: ExprNode): ExprNode[] {
  const weight = (k: number): ExprNode[] => [...(k > 0 ? [ops.pow(t, k)] : []), ...(s && k < degree ? [ops.pow(s, degree - k)] : [])];
  return AXES.map((a) => {
    const P = (i: number) => (a === 'z' ? ops.constant(1) : q[`p${a}${i}`]!);
    const first = scale ? ops.mul(scale, P(1)) : P(1);
    const inner = innerOrders(degree).map((k) => u[`c${k}${a}`]!);
    const last = ops.sub(ops.mul(u.mu!, P(2)), ops.add(first, ...inner, ops.mul(u.lambda!, P(3))));
    const terms = [first, ...inner, last, ops.mul(u.lambda!, P(3))];
    return ops.add(...terms.map((c, k) => (k === 0 && !s ? c : ops.mul(c, ...weight(k)))));
  });
}

/**
 * The 6d − 8 incidence equations x(t_i) − px_i z(t_i) = y(t_i) − py_i z(t_i) = 0 of the traced points (mapAt with
 * `scale`); with `homogeneous`, point i's parameter is the pair (s_i, u_i) of unknowns `s${i}`, `u${i}` instead of `t${i}`.
 */
export function incidenceEquations(degree: number, u: Readonly<Record<string, ExprNode>>, q: Readonly<Record<string, ExprNode>>, ops: Ops, scale?: ExprNode, homogeneous = false): ExprNode[] {
  return tracedPoints(degree).flatMap((i) => {
    const [x, y, z] = homogeneous ? mapAt(degree, u, q, ops, u[`u${i}`]!, scale, u[`s${i}`]!) : mapAt(degree, u, q, ops, u[`t${i}`]!, scale);
    return [ops.sub(x!, ops.mul(q[`px${i}`]!, z!)), ops.sub(y!, ops.mul(q[`py${i}`]!, z!))];
  });
}

/**
 * Rational plane curves of degree d through 3d − 1 points as maps fixed at three of them (α = 1): point i ≥ 4 lies on
 * the curve when x(t_i) − px_i z(t_i) = y(t_i) − py_i z(t_i) = 0. 6d − 8 equations of degree d + 1 (linear in the map's
 * unknowns, degree d in t_i) in 6d − 8 unknowns; one solution per curve (exact, no numerics). Groups: the map, then each t_i.
 */
export function parametrisedMapFormulation(degree: number, description: string): FormulationDefinition {
  return {
    unknowns: mapUnknowns(degree),
    parameters: mapParameters(degree),
    groups: [mapUnknowns(degree).slice(0, 3 * degree - 4), ...tracedPoints(degree).map((i) => [`t${i}`])],
    description,
    equations: (u, q, ops) => incidenceEquations(degree, u, q, ops),
  };
}

/** φ(t) (homogeneous, complex) of a solution x (packed complex, mapUnknowns order) for packed complex parameters p. */
export function mapPoint(degree: number, x: Float64Array, p: Float64Array, t: ComplexPair): ComplexPair[] {
  const lambda = pairAt(x, 0), mu = pairAt(x, 1);
  const power = (k: number): ComplexPair => { let s: ComplexPair = [1, 0]; for (let r = 0; r < k; r++) s = mulPairs(s, t); return s; };
  return AXES.map((_, a) => {
    const P = (i: number): ComplexPair => (a === 2 ? [1, 0] : pairAt(p, 2 * (i - 1) + a));
    const inner = innerOrders(degree).map((k) => pairAt(x, 2 + 3 * (k - 1) + a));
    const last = subPairs(mulPairs(mu, P(2)), addPairs(P(1), ...inner, mulPairs(lambda, P(3))));
    return addPairs(P(1), ...inner.map((c, k) => mulPairs(c, power(k + 1))), mulPairs(last, power(degree - 1)), mulPairs(mulPairs(lambda, P(3)), power(degree)));
  });
}

/** The affine image (x, y) = (φ_x/φ_z, φ_y/φ_z) of t under a solution (complex; φ_z(t) ≠ 0 assumed). */
export function affineMapPoint(degree: number, x: Float64Array, p: Float64Array, t: ComplexPair): [ComplexPair, ComplexPair] {
  const [hx, hy, hz] = mapPoint(degree, x, p, t);
  return [divPairs(hx!, hz!), divPairs(hy!, hz!)];
}

/**
 * A solution-first seed: a random complex map (λ, μ, c_k), random parameter values t_i and points P₁, P₂, P₃, then
 * each traced point put at φ(t_i) in affine coordinates. Returns packed complex parameters and the solution they were
 * built around (residual at rounding level).
 */
export function parametrisedMapSeed(degree: number, random: RandomSource): { parameters: Float64Array; solution: Float64Array } {
  const solution = new Float64Array(2 * mapUnknowns(degree).length);
  for (let k = 0; k < solution.length; k += 2) random.gaussianComplex(solution, k);
  const parameters = new Float64Array(2 * mapParameters(degree).length);
  for (let k = 0; k < 12; k += 2) random.gaussianComplex(parameters, k);
  const firstT = 2 + 3 * (degree - 2);
  tracedPoints(degree).forEach((_, k) => {
    const [px, py] = affineMapPoint(degree, solution, parameters, pairAt(solution, firstT + k));
    parameters.set([...px, ...py], 6 * 2 + 4 * k);
  });
  return { parameters, solution };
}
