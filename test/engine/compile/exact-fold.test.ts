import { describe, expect, it } from 'vitest';
import { isExactComplexProduct, isExactProduct, isExactSum } from '../../../src/engine/compile/exact-fold.ts';
import { createTape } from '../../../src/engine/compile/tape.ts';

// Reference: binary64 arithmetic (IEEE 754-2008); 0.1 and 0.3 are not dyadic, so their product and sum round,
// while products and sums of small integers and powers of two are exact (common practice, no source needed).
describe('exactness of folded constants', () => {
  it.each([
    [3, 7, true],
    [0.5, 0.25, true],
    [0.1, 0.3, false],
    [1 / 3, 3, false],
    [2 ** 600, 2 ** 600, false], // out of the range where Dekker's error term is trusted
    [0, 0.1, true],
  ])('product %s · %s exact: %s', (a, b, exact) => {
    expect(isExactProduct(a, b)).toBe(exact);
  });

  it.each([
    [1, 2, true],
    [0.1, 0.2, false],
    [2 ** 53, 1, false],
    [0.75, -0.25, true],
  ])('sum %s + %s exact: %s', (a, b, exact) => {
    expect(isExactSum(a, b)).toBe(exact);
  });

  it('complex products are exact only when all four partial products and both sums are', () => {
    expect(isExactComplexProduct(1, 2, 3, -4)).toBe(true);
    expect(isExactComplexProduct(0.1, 0, 3, 0)).toBe(false);
  });
});

describe('tape constant folding', () => {
  it('folds in floating point by default and keeps inexact operations with exactFolding', () => {
    const plain = createTape();
    const folded = plain.mul(plain.constant(0.1, 0), plain.constant(0.3, 0));
    expect(plain.instructions[folded]!.op).toBe('const');

    const exact = createTape({ exactFolding: true });
    const kept = exact.mul(exact.constant(0.1, 0), exact.constant(0.3, 0));
    expect(exact.instructions[kept]!.op).toBe('mul');
    const sum = exact.add(exact.constant(0.1, 0), exact.constant(0.2, 0));
    expect(exact.instructions[sum]!.op).toBe('add');
  });

  it('still folds exact constant arithmetic with exactFolding', () => {
    const tape = createTape({ exactFolding: true });
    const six = tape.mul(tape.constant(2, 0), tape.constant(3, 0));
    expect(tape.instructions[six]).toMatchObject({ op: 'const', re: 6, im: 0 });
    const diff = tape.sub(tape.constant(0.75, 1), tape.constant(0.25, 1));
    expect(tape.instructions[diff]).toMatchObject({ op: 'const', re: 0.5, im: 0 });
  });
});
