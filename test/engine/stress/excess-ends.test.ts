import { describe, expect, it } from 'vitest';
import type { PathStatistics } from '../../../src/engine/solve/solve-system.ts';
import { stressSystem } from '../../../generators/bench/stress/stress-system.ts';
import { CHANGES, EXCESS_FAMILIES } from '../../../generators/bench/stress/stress-corpus.ts';
import { solveOnce } from './solve-checks.ts';

// Where the paths go on systems with a positive-dimensional excess component: every f_i vanishes on it (a hyperplane,
// or the curve q₁ = q₂ = 0; see stress-family.ts), and the isolated solutions, e.g. ∏(d_i − 1) for ℓ·g_i by Bézout's
// theorem (Cox–Little–O'Shea 2005, ch. 3), are reached by one path each (Sommese–Wampler 2005, ch. 8, from memory
// for the chapter); so every other path ends on the excess component, finite ('excess') or at infinity.
const SEEDS = [1, 2, 3];
const rows = EXCESS_FAMILIES.flatMap((family) => SEEDS.map((seed) => ({ family, seed, label: `${family.label}, seed ${seed}` })));

describe('the excess path status on systems with a positive-dimensional component', () => {
  describe.each(rows)('$label', ({ family, seed }) => {
    it.each(CHANGES)('$label: every path not at an isolated solution ends as excess or at infinity', async (change) => {
      const report = await solveOnce(stressSystem(family, change.make(family.unknowns, seed), seed));
      const stats: PathStatistics = report.stats;
      expect({ regular: stats.regular, excessOrInfinity: stats.excess + stats.atInfinity, singular: stats.singular, failed: stats.failed })
        .toEqual({ regular: family.expected, excessOrInfinity: stats.tracked - family.expected, singular: 0, failed: 0 });
    });
  });
});
