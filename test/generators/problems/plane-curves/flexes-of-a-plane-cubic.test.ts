import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/plane-curves/flexes-of-a-plane-cubic.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { evaluate, paramsFrom, real } from '../shared/evaluate.ts';
import { drawnRealSolutions, demoInstance, planeDrawing, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);
// The Fermat cubic x³ + y³ + 1 = 0: its flexes are the 9 points with one homogeneous coordinate 0, e.g. (−1, 0)
// (classical; Hesse 1844).
const fermat = paramsFrom(system.parameters, { c30: 1, c21: 0, c12: 0, c03: 1, c20: 0, c11: 0, c02: 0, c10: 0, c01: 0, c00: 1 });

describe('flexes of a plane cubic: the formulation', () => {
  it('the flex (−1, 0) of the Fermat cubic solves both equations', () => {
    for (const e of system.equations) expect(Math.hypot(...evaluate(e, real([-1, 0]), fermat))).toBeLessThan(1e-12);
  });

  it('an ordinary point of the Fermat cubic is on the curve but not on the Hessian', () => {
    const x = 0.5, y = Math.cbrt(-1 - x ** 3);
    const [f, h] = system.equations.map((e) => Math.hypot(...evaluate(e, real([x, y]), fermat)));
    expect(f).toBeLessThan(1e-12);
    expect(h).toBeGreaterThan(1);
  });

  it('the Hessian of the Fermat cubic is 216·xy (times z = 1)', () => {
    const [x, y] = [0.3, -1.7];
    expect(evaluate(system.equations[1]!, real([x, y]), fermat)[0]).toBeCloseTo(216 * x * y, 9);
  });
});

// A smooth plane cubic has 9 flexes (Hesse 1844; Plücker's 3d(d − 2)); a real one has exactly 3 real flexes.
describe('solving flexes of a plane cubic', () => {
  it.each(seeds(20))('random complex cubic %i: 9 flexes, every path regular', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.solutions).toHaveLength(9);
    expect(report.stats).toMatchObject({ tracked: 9, regular: 9, singular: 0, atInfinity: 0, failed: 0 });
  });

  it('the toy railway cubic: 9 flexes, exactly 3 real', async () => {
    const solved = await solveInstance(definition, demoInstance(definition, 'toy-railway'));
    expect(solved.report.solutions).toHaveLength(9);
    expect(solved.real).toBe(3);
    const view = planeDrawing(definition).window({});
    for (const [item] of drawnRealSolutions(definition, demoInstance(definition, 'toy-railway'), solved)) {
      const { x, y } = item as { x: number; y: number };
      expect(x > view.xMin && x < view.xMax && y > view.yMin && y < view.yMax).toBe(true);
    }
  });
});
