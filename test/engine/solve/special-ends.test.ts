import { describe, expect, it } from 'vitest';
import type { PolynomialSystem } from '../../../src/engine/expr/node.ts';
import { add, mul, param, pow, sub, unknown } from '../../../src/engine/expr/build.ts';
import { solveSystem } from '../../../src/engine/solve/solve-system.ts';

const x = unknown('x', 0), y = unknown('y', 1);
const plane = (...equations: PolynomialSystem['equations']): PolynomialSystem => ({ unknowns: ['x', 'y'], parameters: [], equations: [...equations] });
const close = (p: Float64Array, values: number[]): void => values.forEach((v, i) => expect(p[i]).toBeCloseTo(v, 8));

describe('ends at infinity and singular ends', () => {
  it.each([1, 2, 3])('xy = 1 and xy + x = 2 meet once at (1, 1); the other 3 of 4 paths go to infinity (Bézout count with multiplicities at (1:0:0), (0:1:0); seed %i)', async (seed) => {
    // Hand derivation: subtracting gives x = 1, then y = 1; homogenised, h = 0 forces xy = 0.
    const r = await solveSystem(plane(sub(mul(x, y), 1), sub(add(mul(x, y), x), 2)), new Float64Array(0), { seed });
    expect(r.stats).toMatchObject({ tracked: 4, regular: 1, atInfinity: 3, singular: 0, failed: 0 });
    expect(r.solutions).toHaveLength(1);
    close(r.solutions[0]!.point, [1, 0, 1, 0]);
  });

  it.each([1, 2, 3])('the parallel hyperbolas xy = 1 and xy = 2 have no finite common point: all 4 paths at infinity (seed %i)', async (seed) => {
    const r = await solveSystem(plane(sub(mul(x, y), 1), sub(mul(x, y), 2)), new Float64Array(0), { seed });
    expect(r.stats).toMatchObject({ tracked: 4, regular: 0, singular: 0, atInfinity: 4, failed: 0 });
    expect(r.solutions).toHaveLength(0);
  });

  it.each([1, 2, 3])('the unit circle and the parabola y = x² − 1 touch at (0, −1) with multiplicity 2 and cross at (±1, 0) (seed %i)', async (seed) => {
    // Hand derivation: x² + (x² − 1)² − 1 = x²(x² − 1): x = 0 is a double root (Fulton 1969, intersection multiplicity of tangent curves ≥ 2).
    const r = await solveSystem(plane(sub(add(pow(x, 2), pow(y, 2)), 1), sub(y, sub(pow(x, 2), 1))), new Float64Array(0), { seed });
    expect(r.stats).toMatchObject({ tracked: 4, regular: 2, singular: 2, atInfinity: 0, failed: 0 });
    expect(r.solutions).toHaveLength(2);
    close(r.solutions[0]!.point, [-1, 0, 0, 0]);
    close(r.solutions[1]!.point, [1, 0, 0, 0]);
    expect(r.singular).toHaveLength(1);
    expect(r.singular[0]!.multiplicity).toBe(2);
    expect(r.singular[0]!.real).toBe(true);
    close(r.singular[0]!.point, [0, 0, -1, 0]);
  });

  it.each([1, 2, 3])('(x − 1)² = 0, y = x: one double root at (1, 1) (seed %i)', async (seed) => {
    const r = await solveSystem(plane(pow(sub(x, 1), 2), sub(y, x)), new Float64Array(0), { seed });
    expect(r.stats).toMatchObject({ tracked: 2, singular: 2, regular: 0, atInfinity: 0, failed: 0 });
    expect(r.singular).toHaveLength(1);
    expect(r.singular[0]!.multiplicity).toBe(2);
    close(r.singular[0]!.point, [1, 0, 1, 0]);
  });

  it.each([1, 2])('x³ = 0, y = 0: one triple root of multiplicity 3 (seed %i)', async (seed) => {
    const r = await solveSystem(plane(pow(x, 3), y), new Float64Array(0), { seed });
    expect(r.stats).toMatchObject({ tracked: 3, singular: 3, failed: 0 });
    expect(r.singular).toHaveLength(1);
    expect(r.singular[0]!.multiplicity).toBe(3);
    close(r.singular[0]!.point, [0, 0, 0, 0]);
  });

  it.each([1, 2, 3])('x(y − 2) = 0, x(x − 3) = 0: the line x = 0 of solutions absorbs 3 paths as excess ends; the isolated point (3, 2) is found (seed %i)', async (seed) => {
    // Hand derivation: off the line x = 0 both factors must vanish: y = 2, x = 3. Bézout 2·2 = 4 paths.
    const r = await solveSystem(plane(mul(x, sub(y, 2)), mul(x, sub(x, 3))), new Float64Array(0), { seed });
    expect(r.stats).toMatchObject({ tracked: 4, regular: 1, singular: 0, excess: 3, atInfinity: 0, failed: 0 });
    expect(r.solutions).toHaveLength(1);
    close(r.solutions[0]!.point, [3, 0, 2, 0]);
    for (const e of r.ends.filter((e) => e.outcome === 'excess')) expect(Math.hypot(e.point[0]!, e.point[1]!)).toBeLessThan(1e-6);
  });

  it('names a parameter that is not finite', async () => {
    const system: PolynomialSystem = { unknowns: ['x', 'y'], parameters: ['a'], equations: [sub(x, param('a', 0)), sub(y, 1)] };
    await expect(solveSystem(system, new Float64Array([NaN, 0]), { seed: 1 })).rejects.toThrow(/parameter a \(index 0\) is not finite/);
  });
});
