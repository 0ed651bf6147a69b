import { describe, expect, it } from 'vitest';
import { mul, pow, sub, unknown } from '../../../src/engine/expr/build.ts';
import type { ExprNode } from '../../../src/engine/expr/node.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { createAffineTools } from '../../../src/engine/solve/affine.ts';
import { createLocalDimensionTest } from '../../../src/engine/solve/local-dimension.ts';
import { noScaling } from '../../../src/engine/start/scaling.ts';

const x = unknown('x', 0), y = unknown('y', 1);

function testAt(equations: ExprNode[], point: [number, number]): string {
  const compiled = compileSystem({ unknowns: ['x', 'y'], parameters: [], equations });
  const none = new Float64Array(0);
  const tools = createAffineTools(compiled, none);
  const test = createLocalDimensionTest(compiled, none, noScaling(2), tools);
  return test(new Float64Array([point[0], 0, point[1], 0]), 7);
}

// Hand-checked solution sets (common practice, no source): each row names the set and the point tested.
describe('the local dimension test by nearby samples', () => {
  it.each([
    ['x² = y² = 0: the origin, isolated of multiplicity 4', [pow(x, 2), pow(y, 2)], [0, 0], 'isolated'],
    ['x³ = y³ = 0: the origin, isolated of multiplicity 9', [pow(x, 3), pow(y, 3)], [0, 0], 'isolated'],
    ['x − 1 = y − 2 = 0: a nonsingular point', [sub(x, 1), sub(y, 2)], [1, 2], 'isolated'],
    ['xy = x(y − 1) = 0: the line x = 0 (reduced)', [mul(x, y), mul(x, sub(y, 1))], [0, 0.5], 'positive'],
    ['x² = x²y = 0: the line x = 0 counted twice (non-reduced)', [pow(x, 2), mul(pow(x, 2), y)], [0, 0.3], 'positive'],
    ['(x − y)³ = (x − y)³·x = 0: the line x = y counted three times', [pow(sub(x, y), 3), mul(pow(sub(x, y), 3), x)], [0.4, 0.4], 'positive'],
  ] as const)('%s → %s', (_, equations, point, expected) => {
    expect(testAt([...equations], [...point] as [number, number])).toBe(expected);
  });

  it('works in natural units: the line x = 0 of xy = x(y − 1) written with y in units of 10⁶', () => {
    const compiled = compileSystem({ unknowns: ['x', 'y'], parameters: [], equations: [mul(x, y), mul(x, sub(y, 1e6))] });
    const none = new Float64Array(0);
    const scaling = { variables: [0, 20], equations: [-20, -20] };
    const tools = createAffineTools(compiled, none, scaling);
    expect(createLocalDimensionTest(compiled, none, scaling, tools)(new Float64Array([0, 0, 5e5, 0]), 3)).toBe('positive');
  });
});
