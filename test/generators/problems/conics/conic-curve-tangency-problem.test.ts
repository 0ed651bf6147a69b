import { describe, expect, it } from 'vitest';
import { conicCurveCounts, conicCurveTangencyProblem } from '../../../../generators/problems/conics/conic-curve-tangency-problem.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { bezoutBound, multihomogeneousBound } from '../../../../src/engine/index.ts';
import { evaluate, largestResidual, paramsFrom, real, type C } from '../shared/evaluate.ts';

// Chasles's rule m·μ + d·ν (C. R. Acad. Sci. Paris 58, 1864) with class m = d(d − 1) (Plücker 1839) and the
// characteristic numbers 1, 2, 4 of conics through 5, 4, 3 points and 0, 1, 2 lines (Chasles 1864).
const table = [
  { p: 4, l: 0, d: 3, count: 12, total: 36, twoGroup: 15 },
  { p: 4, l: 0, d: 4, count: 20, total: 60, twoGroup: 24 },
  { p: 3, l: 1, d: 3, count: 24, total: 72, twoGroup: 30 },
  { p: 4, l: 0, d: 2, count: 6, total: 18, twoGroup: 8 }, // a conic: 6 (Chasles's ladder 1, 6, 36, …)
  { p: 3, l: 1, d: 2, count: 12, total: 36, twoGroup: 16 }, // the same rule for a conic (m = d = 2), our own arithmetic, no separate source
];

// The planted worked example (our own): the parabola y = x² touches the cubic y = x³ and the quartic y = x³ + x⁴ at the
// origin (both gradients (0, 1) there); the given points (±1, 1), (2, 4), (−2, 4) lie on it, and so does the contact
// (−2, 4) of its tangent line 4x + y + 4 = 0.
function planted(degree: number, lines: number) {
  const g: Record<string, number> = degree === 3 ? { g30: -1, g01: 1 } : { g30: -1, g40: -1, g01: 1 };
  const points = ([[1, 1], [-1, 1], [2, 4], [-2, 4]] as [number, number][]).slice(0, 4 - lines);
  const lineList: [number, number, number][] = lines ? [[4, 1, 4]] : [];
  return { g, points, lineList };
}

describe('conics through points and lines, tangent to a curve: counts and bounds', () => {
  it.each(table)('p = $p, l = $l, degree $d: count $count, total degree $total, two-homogeneous $twoGroup', ({ p, l, d, count, total, twoGroup }) => {
    expect(conicCurveCounts(p, l, d)).toEqual({ count, total, twoGroup, atInfinity: twoGroup - count });
  });

  it.each(table.slice(0, 3))('the formulation has the stated bounds (p = $p, l = $l, degree $d)', ({ p, l, d, total, twoGroup }) => {
    const definition = conicCurveTangencyProblem({
      slug: 'bounds', title: 'bounds', points: p, lines: l, degree: d, curve: 'curve', genericSeed: 1,
      demo: { id: 'x', label: 'x', description: 'x', seed: 1, points: new Array(p).fill([0, 0]), lines: new Array(l).fill([1, 1, 1]), curve: new Array((d + 1) * (d + 2) / 2).fill(1), view: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 } },
    });
    const system = systemOf(definition);
    expect(bezoutBound(system)).toBe(total);
    expect(multihomogeneousBound(system)).toBe(twoGroup);
  });

  it('refuses a family that is not one-dimensional', () => {
    expect(() => conicCurveCounts(3, 0, 3)).toThrow(RangeError);
  });
});

describe.each([[3, 0], [4, 0], [3, 1]])('the equations (degree %i, %i line): the planted parabola y = x² touching at the origin', (degree, lines) => {
  const { g, points, lineList } = planted(degree, lines);
  const definition = conicCurveTangencyProblem({
    slug: 'planted', title: 'planted', points: 4 - lines, lines, degree, curve: 'curve', genericSeed: 1,
    demo: {
      id: 'planted', label: 'planted', description: 'planted', seed: 1, points, lines: lineList,
      curve: systemOfNames(degree).map((n) => g[n] ?? 0), view: { xMin: -3, xMax: 3, yMin: -3, yMax: 3 },
    },
  });
  const system = systemOf(definition);
  const params = paramsFrom(system.parameters, definition.instances[1]!.parameters as Record<string, number>);
  const parabola = [-1, 0, 0, 0, 1, 0]; // −x² + y
  const inChart = (x: number, y: number): C[] => {
    const value = evaluate(system.equations[0]!, real([...parabola, x, y]), params); // h·k − 1
    const h = value[0] + 1;
    return real([...parabola.map((c) => c / h), x, y]);
  };

  it('is solved by the parabola with its contact point (0, 0)', () => {
    expect(largestResidual(system.equations, inChart(0, 0), params)).toBeLessThan(1e-14);
  });

  it('is not solved where the parabola crosses the cubic at (1, 1): the gradients (−2, 1) and (−3, 1) differ', () => {
    if (degree !== 3) return;
    const residuals = system.equations.map((e) => Math.hypot(...evaluate(e, inChart(1, 1), params)));
    expect(Math.max(...residuals.slice(0, -1))).toBeLessThan(1e-14);
    expect(residuals.at(-1)!).toBeGreaterThan(0.1);
  });

  it('draws the conic, the contact with the curve and, with a line, the contact (−2, 4) with the line', () => {
    const q = definition.instances[1]!.parameters as Record<string, number>;
    const items = definition.drawing!.solution([...parabola, 0, 0], q);
    expect(items.map((i) => i.layer)).toEqual(['solution', 'tangency', ...(lines ? ['tangency'] : [])]);
    if (lines) {
      const contact = items[2] as { x: number; y: number };
      expect(contact.x).toBeCloseTo(-2, 12);
      expect(contact.y).toBeCloseTo(4, 12);
    }
  });
});

function systemOfNames(degree: number): string[] {
  const names: string[] = [];
  for (let t = degree; t >= 0; t--) for (let i = t; i >= 0; i--) names.push(`g${i}${t - i}`);
  return names;
}
