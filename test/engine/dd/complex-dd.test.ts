import { describe, expect, it } from 'vitest';
import { complexDdAdd, complexDdMul, complexDdSub } from '../../../src/engine/dd/complex-dd.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { fAdd, fMul, fSub, type Fraction } from '../interval/exact-rational.ts';
import { U, abs, errorInUnits, exactPair, randomPair } from './exact-dd.ts';

// Bounds per part (u = 2⁻⁵³): add and sub 3u² + 13u³ relative (accurate add, Joldes–Muller–Popescu, ACM TOMS
// 44(2), 2017, read second-hand); mul 14u²·(|ar·br| + |ai·bi|) for re and 14u²·(|ar·bi| + |ai·br|) for im (our own
// derivation, dd-product-sum.ts; factor 1 + 2⁻⁴⁰ for second-order terms). Reference: exact BigInt rationals.
const out = new Float64Array(4);
const sumAbs = (a: Fraction, b: Fraction): Fraction => fAdd(abs(a), abs(b));
type Operands = [number, number, number, number, number, number, number, number];

const operands = (seed: number, count: number, kMin: number, kMax: number): Operands[] => {
  const random = createRandom(seed);
  return Array.from({ length: count }, () => [0, 1, 2, 3].flatMap(() => randomPair(random, kMin, kMax)) as Operands);
};
const parts = (o: Operands): [Fraction, Fraction, Fraction, Fraction] =>
  [exactPair(o[0], o[1]), exactPair(o[2], o[3]), exactPair(o[4], o[5]), exactPair(o[6], o[7])];
const computed = (): [Fraction, Fraction] => [exactPair(out[0]!, out[1]!), exactPair(out[2]!, out[3]!)];

describe('complex double-double kernels', () => {
  it.each([
    ['add', complexDdAdd, fAdd],
    ['sub', complexDdSub, fSub],
  ] as const)('%s: each part within 3u² + 13u³ relative (exponents −40…40, 3000 pairs)', (_, kernel, exact) => {
    let worst = 0;
    for (const o of operands(51, 3000, -40, 40)) {
      kernel(...o, out, 0);
      const [ar, ai, br, bi] = parts(o), [cr, ci] = computed();
      worst = Math.max(worst, errorInUnits(cr, exact(ar, br)), errorInUnits(ci, exact(ai, bi)));
    }
    expect(worst).toBeLessThanOrEqual(3 + 13 * U);
  });

  it.each([
    ['exponents −40…40', -40, 40],
    ['comparable magnitudes (cancellation in the real part likely)', 0, 1],
  ] as const)('mul: each part within 14u² of the sum of its two product magnitudes (%s, 3000 pairs)', (_, kMin, kMax) => {
    let worst = 0;
    for (const o of operands(52, 3000, kMin, kMax)) {
      complexDdMul(...o, out, 0);
      const [ar, ai, br, bi] = parts(o), [cr, ci] = computed();
      const rr = fMul(ar, br), ii = fMul(ai, bi), ri = fMul(ar, bi), ir = fMul(ai, br);
      worst = Math.max(worst, errorInUnits(cr, fSub(rr, ii), sumAbs(rr, ii)), errorInUnits(ci, fAdd(ri, ir), sumAbs(ri, ir)));
    }
    expect(worst).toBeLessThanOrEqual(14 * (1 + 2 ** -40));
  });
});
