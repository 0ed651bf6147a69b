import { describe, expect, it } from 'vitest';
import { BENCH_SEEDS, CHANGES, DENSE_FAMILIES, EXCESS_FAMILIES } from '../../../../generators/bench/stress/stress-corpus.ts';
import { stressSystem } from '../../../../generators/bench/stress/stress-system.ts';

describe('the stress corpus', () => {
  it('names every family × change × seed uniquely, in unknowns x1 … xn', () => {
    const names = [...DENSE_FAMILIES, ...EXCESS_FAMILIES].flatMap((f) => CHANGES.flatMap((c) => [1, 2].map((seed) => {
      const s = stressSystem(f, c.make(f.unknowns, seed), seed);
      expect(s.system.unknowns).toEqual(Array.from({ length: f.unknowns }, (_, j) => `x${j + 1}`));
      expect(s.system.parameters).toHaveLength(s.parameters.length / 2);
      return s.name;
    })));
    expect(new Set(names).size).toBe(names.length);
  });

  it('shares one seed’s coefficients among all changes of coordinates, and builds the same system twice alike', () => {
    const family = DENSE_FAMILIES[0]!;
    const [base, ...variants] = CHANGES.map((c) => stressSystem(family, c.make(3, 6), 6));
    for (const v of variants) expect(v.parameters.subarray(v.parameters.length - base!.parameters.length)).toEqual(base!.parameters);
    // a linear change's matrix comes first: 9 entries a1_1 … a3_3
    expect(variants[3]!.system.parameters.slice(0, 10)).toEqual(['a1_1', 'a1_2', 'a1_3', 'a2_1', 'a2_2', 'a2_3', 'a3_1', 'a3_2', 'a3_3', 'c0']);
    expect(stressSystem(family, CHANGES[4]!.make(3, 6), 6).system).toEqual(stressSystem(family, CHANGES[4]!.make(3, 6), 6).system);
  });

  it('has the base, three scalings (40, 10³, 10⁻³) and a linear change, and bench seeds 1 … 10', () => {
    expect(CHANGES.map((c) => c.label)).toEqual(['base', 'scaled ×40', 'scaled ×1000', 'scaled ×0.001', 'linear change']);
    expect(BENCH_SEEDS).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
  });
});
