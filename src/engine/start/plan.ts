import type { ExprNode, PolynomialSystem } from '../expr/node.ts';
import { add, mul, param, sub } from '../expr/build.ts';
import { degree, groupDegrees } from '../expr/degree.ts';
import { createRandom } from '../random.ts';
import { compileSystem, type CompiledEquations } from '../compile/compile-system.ts';
import { substituteUnknowns } from '../expr/substitute.ts';
import type { SystemScaling } from './scaling.ts';
import { naturalUnits } from './natural-units.ts';
import type { CompiledHomotopyArgs } from '../homotopies/compiled-module.ts';
import { validateGroups } from './groups.ts';
import { multihomogenize } from './homogenize.ts';
import { chartEquation, type ParameterBank, type StartSystem } from './start-system.ts';
import { totalDegreeStart } from './total-degree.ts';
import { multihomogeneousStart } from './multihomogeneous.ts';

/** Where the planned homotopies start (s = 1: the start system) and end (s = 0: the target). */
export const TRACK_FROM = 1;
export const TRACK_TO = 0;

/** Everything needed to track a start system to the target: the homotopy's module arguments and start points. */
export interface HomotopyPlan {
  readonly startSystem: 'total-degree' | 'multihomogeneous';
  /** The target's natural units: the homotopy tracks y with x = 2^c ⊙ y, equation i scaled by 2^{r_i}. */
  readonly scaling: SystemScaling;
  /** Multiprojective groups in homotopy coordinates (homogenising coordinate last). */
  readonly projectiveGroups: readonly (readonly number[])[];
  /** Homotopy coordinates: N = n + number of groups. */
  readonly N: number;
  readonly count: number;
  readonly starts: Float64Array;
  readonly args: CompiledHomotopyArgs;
  /** The homotopy's compiled program (for its double-double evaluator, generated only when a path needs it). */
  readonly program: NonNullable<CompiledEquations['program']>;
}

/**
 * Plans the homotopy H(X, s) = s·γ·G(X) + (1 − s)·F̂(X) (F̂: the target multihomogenised), tracked from the start
 * system at s = 1 (TRACK_FROM) to the target at s = 0 (TRACK_TO): the end sits at s = 0, where doubles are dense,
 * so the endgame can sample as close to the end as its conditioning allows (at t = 1 − s, s could not go below
 * about 1e-15). One random
 * complex chart equation per group left unchanged along the path: the gamma trick of Morgan (1987) with γ
 * uniform on the unit circle. Random draws from `seed`, in this order: γ, the charts (group by group,
 * Gaussian complex), then the start system's forms. Same seed ⇒ same plan. The target is tracked in its natural
 * units (`scaling`, see coefficientScaling): F̂ becomes diag(2^r)·F̂(2^c ⊙ y, h), so its coefficients are near 1 in
 * modulus and its solutions near the unit sphere whatever units the definition was written in. Everything random,
 * the scale factors and the target's parameter values enter the compiled code as parameters (t first), so the code
 * depends only on the system's structure and stays warm across solves and instances (s is parameter 0).
 */
export function planHomotopy(system: PolynomialSystem, parameters: Float64Array, seed: number, kind: 'total-degree' | 'multihomogeneous', scaling: SystemScaling = naturalUnits(system, parameters)): HomotopyPlan {
  const np = system.parameters.length;
  if (parameters.length !== 2 * np) {
    throw new RangeError(`expected ${np} parameter values (packed length ${2 * np}), got length ${parameters.length}`);
  }
  const bad = parameters.findIndex((v) => !Number.isFinite(v));
  if (bad >= 0) throw new RangeError(`parameter ${system.parameters[bad >> 1]} (index ${bad >> 1}) is not finite: ${parameters[bad]}`);
  if (kind === 'multihomogeneous' && !system.groups) throw new RangeError('a multihomogeneous start needs variable groups (system.groups)');
  const groups = validateGroups(system, kind === 'multihomogeneous' ? system.groups : undefined);
  const n = system.unknowns.length, N = n + groups.length;
  const values: number[] = Array.from(parameters);
  const names: string[] = ['s', ...system.parameters];
  const bank: ParameterBank = {
    add(re, im) {
      values.push(re, im);
      names.push(`r${names.length}`);
      return param(names[names.length - 1]!, names.length - 1);
    },
  };
  const random = createRandom(seed);
  const gammaValue = new Float64Array(2);
  random.unitComplex(gammaValue, 0);
  const gamma = bank.add(gammaValue[0]!, gammaValue[1]!);
  const coords = groups.map((g, k) => [...g, n + k]);
  const charts = coords.map((c) => {
    const v = new Float64Array(2 * c.length);
    for (let k = 0; k < c.length; k++) random.gaussianComplex(v, 2 * k);
    return v;
  });
  const chartRows = coords.map((c, k) => chartEquation(c, charts[k]!, bank));
  const start: StartSystem = kind === 'total-degree'
    ? totalDegreeStart(system.equations.map((e) => degree(e)), charts[0]!)
    : multihomogeneousStart(groupDegrees(system.equations, groups), groups, charts, random, bank);
  const homogeneous = multihomogenize(system.equations, groups, n, (node) => param(node.name, node.index + 1));
  const units = scaling.variables.map((c) => bank.add(2 ** c, 0));
  const rows = scaling.equations.map((r) => bank.add(2 ** r, 0));
  const target = substituteUnknowns(homogeneous, (node) => (node.index < n ? mul(units[node.index]!, node) : node)).map((f, i) => mul(rows[i]!, f));
  const s = param('s', 0);
  const equations: ExprNode[] = target.map((f, i) => add(mul(s, gamma, start.equations[i]!), mul(sub(1, s), f)));
  equations.push(...chartRows);
  const unknowns = [...system.unknowns, ...groups.map((_, k) => `h${k}`)];
  const compiled = compileSystem({ unknowns, parameters: names, equations }, { derivativeParameters: [0] });
  const args: CompiledHomotopyArgs = {
    source: compiled.source,
    shape: { neq: N, n: N, np: names.length, derivativeParameters: [0] },
    fixed: new Float64Array(values),
    projectiveGroups: coords,
  };
  return { startSystem: kind, scaling, projectiveGroups: coords, N, count: start.count, starts: start.starts, args, program: compiled.program! };
}
