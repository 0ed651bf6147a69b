import { describe, expect, it } from 'vitest';
import { nextDown, nextUp } from '../../../src/engine/interval/next-float.ts';
import { widenDown, widenUp } from '../../../src/engine/interval/outward.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { randomDouble } from './random-doubles.ts';

// Reference: the exact neighbours from the IEEE 754 bit pattern (next-float.ts, itself checked against BigInt
// bit arithmetic). The fast widening must never land inside (x, nextUp(x)) and must stay within three floats.
function check(x: number): void {
  const up = widenUp(x), down = widenDown(x);
  expect(up >= nextUp(x), `widenUp(${x}) = ${up} < nextUp = ${nextUp(x)}`).toBe(true);
  expect(up <= nextUp(nextUp(nextUp(x))), `widenUp(${x}) = ${up} too far`).toBe(true);
  expect(down <= nextDown(x), `widenDown(${x}) = ${down} > nextDown = ${nextDown(x)}`).toBe(true);
  expect(down >= nextDown(nextDown(nextDown(x))), `widenDown(${x}) = ${down} too far`).toBe(true);
}

describe('fast outward widening', () => {
  it('reaches past the neighbouring float at every binade edge from 2⁻¹⁰⁷⁴ to 2¹⁰²³, both signs', () => {
    for (let k = -1074; k <= 1023; k++) {
      const edge = 2 ** k;
      for (const x of [edge, nextUp(edge), nextDown(edge), nextDown(nextDown(edge))]) {
        if (!Number.isFinite(x) || x === 0) continue;
        check(x);
        check(-x);
      }
    }
  });

  it.each([[0], [-0], [2 ** -1074], [2 ** -1022], [1], [Number.MAX_VALUE]])('reaches past the neighbour of %s', (x) => {
    check(x);
  });

  it('reaches past the neighbouring float for 20000 random doubles', () => {
    const random = createRandom(1969);
    for (let k = 0; k < 20000; k++) {
      const x = randomDouble(random);
      if (Number.isFinite(x) && Math.abs(x) < Number.MAX_VALUE) check(x);
    }
  });

  it.each([
    ['widenUp(+∞)', widenUp(Infinity), Infinity],
    ['widenDown(−∞)', widenDown(-Infinity), -Infinity],
    ['widenUp(MAX_VALUE)', widenUp(Number.MAX_VALUE), Infinity],
    ['widenUp(−∞)', widenUp(-Infinity), -Number.MAX_VALUE],
    ['widenDown(+∞)', widenDown(Infinity), Number.MAX_VALUE],
    ['widenUp(NaN)', widenUp(NaN), NaN],
  ])('%s is %s', (_name, value, expected) => {
    expect(Object.is(value, expected)).toBe(true);
  });
});
