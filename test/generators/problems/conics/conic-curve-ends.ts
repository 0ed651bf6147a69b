import type { InstanceDefinition, ProblemDefinition } from '../../../../src/atlas/definition.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../../src/atlas/parameters-of.ts';
import { naturalUnits, type SolveReport } from '../../../../src/engine/index.ts';
import { monomialExponents } from '../../../../generators/problems/shared/monomials.ts';

type C = [number, number];
const mul = (a: C, b: C): C => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
const add = (a: C, b: C): C => [a[0] + b[0], a[1] + b[1]];
const abs = (a: C): number => Math.hypot(a[0], a[1]);
const power = (a: C, k: number): C => Array.from({ length: k }).reduce<C>((s) => mul(s, a), [1, 0]);

/**
 * For each at-infinity end of a conic-and-curve solve: the contact direction (x : y), the relative size of the curve's
 * top-degree form there (|g_d(x, y)| / Σ|g_ij|·|x|^i|y|^j) and of the conic's quadratic part (|a x² + b xy + c y²| over
 * the same with moduli), and the direction itself. Both forms vanish when the conic passes through a point at infinity
 * of the curve. Directions are rescaled from the solver's natural units.
 */
export function endsAtInfinity(definition: ProblemDefinition, instance: InstanceDefinition, report: SolveReport, degree: number): { curveForm: number; conicForm: number; direction: [C, C] }[] {
  const system = systemOf(definition);
  const parameters = parametersOf(definition, instance);
  const units = naturalUnits(system, parameters).variables.map((c) => 2 ** c);
  const param = (name: string): C => { const i = system.parameters.indexOf(name); return [parameters[2 * i]!, parameters[2 * i + 1]!]; };
  const top = monomialExponents(2, degree).filter(([i, j]) => i! + j! === degree);
  return report.ends.filter((e) => e.outcome === 'at-infinity').map((end) => {
    const z = Array.from({ length: 8 }, (_, k): C => [end.point[2 * k]! * units[k]!, end.point[2 * k + 1]! * units[k]!]);
    const [x, y] = [z[6]!, z[7]!];
    const scale = Math.max(abs(x), abs(y));
    const u: C = [x[0] / scale, x[1] / scale], v: C = [y[0] / scale, y[1] / scale];
    let g: C = [0, 0], gAbs = 0;
    for (const [i, j] of top) {
      const term = mul(param(`g${i}${j}`), mul(power(u, i!), power(v, j!)));
      g = add(g, term);
      gAbs += abs(param(`g${i}${j}`)) * abs(u) ** i! * abs(v) ** j!;
    }
    const [a, b, c] = [z[0]!, z[1]!, z[2]!];
    const q = add(add(mul(a, mul(u, u)), mul(b, mul(u, v))), mul(c, mul(v, v)));
    const qAbs = abs(a) * abs(u) ** 2 + abs(b) * abs(u) * abs(v) + abs(c) * abs(v) ** 2;
    return { curveForm: abs(g) / gAbs, conicForm: abs(q) / qAbs, direction: [u, v] as [C, C] };
  });
}

/** How many of the directions (x : y) coincide, as sorted cluster sizes: two are one point when |x₁y₂ − x₂y₁| ≤ 1e-6·|·||·|. */
export function directionClusterSizes(directions: readonly [C, C][]): number[] {
  const same = ([u1, v1]: [C, C], [u2, v2]: [C, C]): boolean => {
    const m = add(mul(u1, v2), mul([-u2[0], -u2[1]], v1));
    return abs(m) <= 1e-6 * Math.hypot(abs(u1), abs(v1)) * Math.hypot(abs(u2), abs(v2));
  };
  const sizes: number[] = [];
  const left = [...directions];
  while (left.length) {
    const first = left.shift()!;
    const rest = left.filter((d) => !same(first, d));
    sizes.push(left.length - rest.length + 1);
    left.splice(0, left.length, ...rest);
  }
  return sizes.sort((a, b) => a - b);
}
