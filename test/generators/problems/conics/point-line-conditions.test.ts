import { describe, expect, it } from 'vitest';
import { pointLineProblem, characteristicNumbers, tangencyQuadric } from '../../../../generators/problems/conics/point-line-conditions.ts';
import { exprBuilders as ops } from '../../../../src/engine/index.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { evaluate, largestResidual, paramsFrom, real, type C } from '../shared/evaluate.ts';
import { drawnRealSolutions, demoInstance, randomInstance, seeds, solveInstance, splitSeeds, worstResidual } from '../shared/solve.ts';
import conicsThrough5Points from '../../../../generators/problems/conics/conics-through-5-points.ts';
import conicsThrough4Points from '../../../../generators/problems/conics/conics-through-4-points-tangent-to-1-line.ts';
import conicsThrough3Points from '../../../../generators/problems/conics/conics-through-3-points-tangent-to-2-lines.ts';
import conicsThrough2Points from '../../../../generators/problems/conics/conics-through-2-points-tangent-to-3-lines.ts';
import conicsThrough1Point from '../../../../generators/problems/conics/conics-through-1-point-tangent-to-4-lines.ts';
import conicsTangentTo5Lines from '../../../../generators/problems/conics/conics-tangent-to-5-lines.ts';

const k = Object.fromEntries(['a', 'b', 'c', 'd', 'e', 'f'].map((n, i) => [n, ops.unknown(n, i)]));
const tangency = (conic: number[], line: [number, number, number]) =>
  Math.hypot(...evaluate(tangencyQuadric(ops, k, ops.constant(line[0]), ops.constant(line[1]), ops.constant(line[2])), real(conic), []));

describe('conics through points and tangent to lines: the conditions', () => {
  it('tangency vanishes for a tangent line of a circle and not for a secant', () => {
    const circle = [1, 0, 1, 0, 0, -4]; // x² + y² = 4
    const phi = 0.7;
    expect(tangency(circle, [Math.cos(phi), Math.sin(phi), -2])).toBeLessThan(1e-12);
    expect(tangency(circle, [Math.cos(phi), Math.sin(phi), -1])).toBeGreaterThan(1);
  });

  it('tangency vanishes identically on a double line (the excess locus)', () => {
    const doubled = [1, -2, 1, 2, -2, 1]; // (x − y + 1)²
    for (const line of [[1, 2, 3], [-0.3, 0.9, 4], [5, 1, -2]] as [number, number, number][]) expect(tangency(doubled, line)).toBeLessThan(1e-12);
  });

  describe.each([5, 4, 3, 2, 1, 0])('with %i points', (p) => {
    // Plant a solution: the circle x² + y² = 4 through points on it and tangent to lines touching it.
    const points = Array.from({ length: p }, (_, i) => [2 * Math.cos(1 + 1.1 * i), 2 * Math.sin(1 + 1.1 * i)] as const);
    const lines = Array.from({ length: 5 - p }, (_, j) => [Math.cos(0.4 + 1.3 * j), Math.sin(0.4 + 1.3 * j), -2] as const);
    const definition = pointLineProblem(p, 1, { id: 'planted', label: 'planted', description: 'planted', points, lines });
    const system = systemOf(definition);

    it(`states the characteristic number ${characteristicNumbers[p]} as its true count`, () => {
      expect(definition.trueCount.value).toBe(characteristicNumbers[p]);
    });

    it('is satisfied by the planted circle, scaled into the chart', () => {
      const circle: C[] = real([1, 0, 1, 0, 0, -4]);
      const params = paramsFrom(system.parameters, definition.instances[1]!.parameters as Record<string, number>);
      // Scale so the chart equation holds: h·circle is the chart equation's value at the circle plus 1.
      const chartValue = evaluate(system.equations[0]!, circle, params);
      const h: C = [chartValue[0] + 1, chartValue[1]];
      const n = h[0] ** 2 + h[1] ** 2;
      const scaled = circle.map(([re]): C => [(re * h[0]) / n, (-re * h[1]) / n]);
      expect(largestResidual(system.equations, scaled, params)).toBeLessThan(1e-12);
    });
  });
});

// Seeds whose strict check fails through an engine issue reported to the lead (minimal failing cases).
const engineIssues: Record<number, number[]> = {};

// The characteristic numbers of conics 1, 2, 4, 4, 2, 1 (Chasles 1864; Bashelor–Ksir–Traves, Amer. Math.
// Monthly 115 (2008)). The surplus paths of the naive count 2^(5−p) must all end on the double lines (our own
// derivation: adj(M) = 0 there); with a complex chart none reach infinity. Through two points there is one double
// line, an isolated singular point reached by all four surplus paths; through one point or none the double lines
// form a curve or a surface, a positive-dimensional excess set ('excess').
describe.each([
  [conicsThrough5Points, 5],
  [conicsThrough4Points, 4],
  [conicsThrough3Points, 3],
  [conicsThrough2Points, 2],
  [conicsThrough1Point, 1],
  [conicsTangentTo5Lines, 0],
] as const)('solving %s', (definition, p) => {
  const count = characteristicNumbers[p]!;
  const bound = 2 ** (5 - p);

  const check = async (seed: number) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.solutions).toHaveLength(count);
    const surplus = p <= 1 ? { singular: 0, excess: bound - count } : { singular: bound - count, excess: 0 };
    expect(report.stats).toMatchObject({ tracked: bound, regular: count, ...surplus, atInfinity: 0, failed: 0 });
    if (p === 2) expect(report.singular.map((s) => s.multiplicity)).toEqual([4]); // the one double line through both points
  };
  const title = `random complex instance %i: ${count} conics, ${bound - count} paths on the double lines, none failed`;
  const { checked, skipped } = splitSeeds(seeds(20), engineIssues[p]);
  it.each(checked)(title, check);
  it.skip.each(skipped)(`${title} (engine issue: paths ending on the curve of double lines fail by step underflow)`, check);

  it(`the flower-bed demo: ${count} conics, all real`, async () => {
    const solved = await solveInstance(definition, demoInstance(definition, 'flower-bed'));
    expect(solved.report.solutions).toHaveLength(count);
    expect(solved.real).toBe(count);
    expect(drawnRealSolutions(definition, demoInstance(definition, 'flower-bed'), solved).flat().filter((i) => i.shape === 'conic')).toHaveLength(count);
  });
});
