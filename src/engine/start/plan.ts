import type { ExprNode, PolynomialSystem } from '../expr/node.ts';
import { add, constant, mul, param, sub } from '../expr/build.ts';
import { degree, groupDegrees } from '../expr/degree.ts';
import { createRandom } from '../random.ts';
import { compileSystem } from '../compile/compile-system.ts';
import type { CompiledHomotopyArgs } from '../homotopies/compiled-module.ts';
import { validateGroups } from './groups.ts';
import { multihomogenize } from './homogenize.ts';
import { chartEquation, type StartSystem } from './start-system.ts';
import { totalDegreeStart } from './total-degree.ts';
import { multihomogeneousStart } from './multihomogeneous.ts';

/** Everything needed to track a start system to the target: the homotopy's module arguments and start points. */
export interface HomotopyPlan {
  readonly startSystem: 'total-degree' | 'multihomogeneous';
  /** Multiprojective groups in homotopy coordinates (homogenising coordinate last). */
  readonly projectiveGroups: readonly (readonly number[])[];
  /** Homotopy coordinates: N = n + number of groups. */
  readonly N: number;
  readonly count: number;
  readonly starts: Float64Array;
  readonly args: CompiledHomotopyArgs;
}

/**
 * Plans the homotopy H(X, t) = (1 − t)·γ·G(X) + t·F̂(X) (F̂: the target multihomogenised at the given
 * parameters), with one random complex chart equation per group left unchanged along the path: the gamma
 * trick of Morgan (1987) with γ uniform on the unit circle. Random draws from `seed`, in this order: γ, the
 * charts (group by group, Gaussian complex), then the start system's forms. Same seed ⇒ same plan.
 */
export function planHomotopy(system: PolynomialSystem, parameters: Float64Array, seed: number, kind: 'total-degree' | 'multihomogeneous'): HomotopyPlan {
  if (parameters.length !== 2 * system.parameters.length) {
    throw new RangeError(`expected ${system.parameters.length} parameter values (packed length ${2 * system.parameters.length}), got length ${parameters.length}`);
  }
  if (kind === 'multihomogeneous' && !system.groups) throw new RangeError('a multihomogeneous start needs variable groups (system.groups)');
  const groups = validateGroups(system, kind === 'multihomogeneous' ? system.groups : undefined);
  const n = system.unknowns.length, N = n + groups.length;
  const random = createRandom(seed);
  const gamma = new Float64Array(2);
  random.unitComplex(gamma, 0);
  const coords = groups.map((g, k) => [...g, n + k]);
  const charts = coords.map((c) => {
    const v = new Float64Array(2 * c.length);
    for (let k = 0; k < c.length; k++) random.gaussianComplex(v, 2 * k);
    return v;
  });
  const start: StartSystem = kind === 'total-degree'
    ? totalDegreeStart(system.equations.map((e) => degree(e)), charts[0]!)
    : multihomogeneousStart(groupDegrees(system.equations, groups), groups, charts, random);
  const target = multihomogenize(system.equations, groups, n, parameters);
  const t = param('t', 0);
  const g = constant(gamma[0]!, gamma[1]!);
  const equations: ExprNode[] = target.map((f, i) => add(mul(sub(1, t), g, start.equations[i]!), mul(t, f)));
  coords.forEach((c, k) => equations.push(chartEquation(c, charts[k]!)));
  const unknowns = [...system.unknowns, ...groups.map((_, k) => `h${k}`)];
  const compiled = compileSystem({ unknowns, parameters: ['t'], equations });
  const args: CompiledHomotopyArgs = {
    source: compiled.source,
    shape: { neq: N, n: N, np: 1 },
    p0: new Float64Array([0, 0]),
    p1: new Float64Array([1, 0]),
    projectiveGroups: coords,
  };
  return { startSystem: kind, projectiveGroups: coords, N, count: start.count, starts: start.starts, args };
}
