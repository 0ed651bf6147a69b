import { describe, expect, it } from 'vitest';
import { naiveRunDifferences } from '../../../generators/bench/naive-run-differences.ts';
import { NAIVE_FIVE_CONICS_RUN } from '../../../generators/problems/conics/naive-run-figures.ts';

describe('the naive-run check', () => {
  it('finds no difference when the measurement agrees', () => {
    expect(naiveRunDifferences(NAIVE_FIVE_CONICS_RUN, { ...NAIVE_FIVE_CONICS_RUN })).toEqual([]);
  });

  it.each([
    ['a count', { failedPaths: 2, genuinePaths: 3262 }, ['genuinePaths: 3264 → 3262', 'failedPaths: 0 → 2']],
    ['the engine version', { engineVersion: '9.9.9' }, ['engineVersion: 0.2.0 → 9.9.9']],
  ])('names each field whose value differs (%s), recorded before measured', (_name, change, expected) => {
    expect(naiveRunDifferences(NAIVE_FIVE_CONICS_RUN, { ...NAIVE_FIVE_CONICS_RUN, ...change })).toEqual(expected);
  });
});
