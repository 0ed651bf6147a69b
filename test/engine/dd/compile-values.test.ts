import { describe, expect, it } from 'vitest';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { add, constant, mul, param, pow, unknown } from '../../../src/engine/expr/build.ts';
import { compileValuesInDoubleDouble, doubleDoubleValuesFromSource } from '../../../src/engine/dd/compile-values.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { randomPair } from './exact-dd.ts';

const [x, y, a] = [unknown('x', 0), unknown('y', 1), param('a', 0)];
const compiled = compileSystem({
  unknowns: ['x', 'y'],
  parameters: ['a'],
  equations: [add(pow(x, 3), mul(a, y), constant(0.25, -1)), add(mul(x, y), mul(-3, y, y), a), x],
});
const dd = compileValuesInDoubleDouble(compiled.program!);
const random = createRandom(1201);
const xhi = new Float64Array(4), xlo = new Float64Array(4);
for (let j = 0; j < 4; j++) [xhi[j], xlo[j]] = randomPair(random, -2, 1);
const p = Float64Array.of(0.3, -1.1);

describe('compileValuesInDoubleDouble', () => {
  it('writes v = the rounded values and vlo = the exact remainders (v + vlo normalised), and skips vlo when null', () => {
    const v = new Float64Array(6), vlo = new Float64Array(6), only = new Float64Array(6);
    dd.evaluate(xhi, xlo, p, v, vlo);
    dd.evaluate(xhi, xlo, p, only, null);
    expect(Array.from(only)).toEqual(Array.from(v));
    for (let k = 0; k < 6; k++) expect(v[k]! + vlo[k]!).toBe(v[k]);
    // the third equation is x itself: its pair comes back unchanged
    expect([v[4], vlo[4], v[5], vlo[5]]).toEqual([xhi[0], xlo[0], xhi[1], xlo[1]]);
  });

  it('rebuilds bit-identically from its source text, reusing the cached function', () => {
    const again = doubleDoubleValuesFromSource(dd.source);
    expect(again.evaluate).toBe(dd.evaluate);
    const v = new Float64Array(6), vlo = new Float64Array(6), v2 = new Float64Array(6), vlo2 = new Float64Array(6);
    dd.evaluate(xhi, xlo, p, v, vlo);
    again.evaluate(xhi, xlo, p, v2, vlo2);
    expect(Array.from(v2)).toEqual(Array.from(v));
    expect(Array.from(vlo2)).toEqual(Array.from(vlo));
  });

  it('emits straight-line code with no calls and no allocation', () => {
    const body = dd.source.slice(dd.source.indexOf('{') + 1).replace('if (vlo === null) return;', '');
    expect(body).not.toMatch(/[A-Za-z_$][\w$]*\s*\(/);
    expect(body).not.toMatch(/\bnew\b|\[\s*\]|\{\s*\}/);
  });

  it('refuses a constant whose split overflows (1e305) in a product', () => {
    const big = compileSystem({ unknowns: ['x'], parameters: [], equations: [mul(1e305, x)] });
    expect(() => compileValuesInDoubleDouble(big.program!)).toThrow(RangeError);
  });
});
