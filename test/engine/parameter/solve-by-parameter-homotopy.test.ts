import Complex from 'complex.js';
import { describe, expect, it } from 'vitest';
import * as ops from '../../../src/engine/expr/build.ts';
import type { PolynomialSystem } from '../../../src/engine/expr/node.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { COMPILED_LEG_MODULE } from '../../../src/engine/parameter/compiled-leg-module.ts';
import { solveByParameterHomotopy, type ParameterProblem } from '../../../src/engine/parameter/solve-by-parameter-homotopy.ts';

// x² = p, y² = q: four solutions (±√p, ±√q); complex.js (a general-purpose library) gives the reference roots.
const x = ops.unknown('x', 0), y = ops.unknown('y', 1), p = ops.param('p', 0), q = ops.param('q', 1);
const squares: PolynomialSystem = { unknowns: ['x', 'y'], parameters: ['p', 'q'], equations: [ops.sub(ops.pow(x, 2), p), ops.sub(ops.pow(y, 2), q)] };
const compiled = compileSystem(squares);
const problem = (route: 'direct' | 'detour'): [ParameterProblem, 'direct' | 'detour'] => [{
  shown: squares,
  working: { url: COMPILED_LEG_MODULE, constants: { source: compiled.source, shape: { neq: 2, n: 2, np: 2 } } },
  start: { parameters: Float64Array.of(4, 0, 9, 0), solutions: [[2, 3], [2, -3], [-2, 3], [-2, -3]].map(([a, b]) => Float64Array.of(a!, 0, b!, 0)) },
  toShown: (v) => v.slice(),
}, route];

describe.each([problem('direct'), problem('detour')])('parameter homotopy on x² = p, y² = q', (prob, route) => {
  it(`(${route}) reaches all four solutions of a complex target, each a pair of square roots`, async () => {
    const target = Float64Array.of(-1.3, 0.7, 0.4, -2.2);
    const report = await solveByParameterHomotopy(prob, target, { seed: 7, route });
    expect(report.stats).toMatchObject({ tracked: 4, regular: 4, failed: 0 });
    expect(report.solutions).toHaveLength(4);
    expect(report.bezoutBound).toBe(4);
    const rp = new Complex(-1.3, 0.7).sqrt(), rq = new Complex(0.4, -2.2).sqrt();
    for (const s of report.solutions) {
      expect(Math.abs(Math.abs(s.point[0]!) - Math.abs(rp.re))).toBeLessThan(1e-10);
      expect(Math.abs(Math.abs(s.point[1]!) - Math.abs(rp.im))).toBeLessThan(1e-10);
      expect(Math.abs(Math.abs(s.point[2]!) - Math.abs(rq.re))).toBeLessThan(1e-10);
      expect(Math.abs(Math.abs(s.point[3]!) - Math.abs(rq.im))).toBeLessThan(1e-10);
    }
  });
});

describe('parameter homotopy input checks', () => {
  it('names the mismatch when the target has the wrong number of parameters', async () => {
    await expect(solveByParameterHomotopy(problem('direct')[0], new Float64Array(6), { seed: 1 })).rejects.toThrow(/3 complex parameters, the stored start 2/);
  });
});
