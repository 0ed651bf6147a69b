import { describe, expect, it } from 'vitest';
import { stressSystem } from '../../../generators/bench/stress/stress-system.ts';
import { CHANGES, DENSE_FAMILIES, EXCESS_FAMILIES } from '../../../generators/bench/stress/stress-corpus.ts';
import { compareMapped, expectEveryPathAccountedFor, outcome, solveOnce } from './solve-checks.ts';

// The stress corpus on the total-degree homotopy. Each family has a known number of isolated solutions, all finite
// and nonsingular (the family's `reason` names the source):
// - dense random systems, every monomial of degree ≤ d_i with a Gaussian complex coefficient: ∏ d_i (Bézout's theorem
//   for generic dense systems; Cox, Little, O'Shea, Using Algebraic Geometry, 2nd ed. 2005, ch. 3);
// - ℓ·g_i (hyperplane excess): ∏(d_i − 1) (Bézout's theorem for the dense g; the argument is in stress-family.ts);
// - q₁a_i + q₂b_i (excess on a quartic space curve): e³ + 6e² (our bihomogeneous count, confirmed by Gröbner bases in
//   Singular, over Q for e = 1, 2 and over F_32003 for e = 1, 2, 3: isolated-counts.sing beside this file).
// Each is run as built and after four changes of coordinates — unknowns scaled by 40, 10³ and 10⁻³ (each solution σ
// times larger) and a random complex linear change x ↦ A·x — which keep the count and move the solutions to
// fromBase(base solution). A total-degree homotopy reaches an isolated solution of multiplicity μ by exactly μ paths
// (Sommese–Wampler, The Numerical Solution of Systems of Polynomials, 2005, ch. 8, from memory for the chapter), so
// each nonsingular solution is found by one path.
// CI runs the seeds below; `npm run bench -- --suite stress --runs 1` runs seeds 1…10 of every family.
const CI_SEEDS = new Map<string, readonly number[]>([
  ['dense (6,6,6)', [1, 2]],
  ['dense (4,4,4,4)', [1, 2]],
  ['dense (3,3,3,3,3)', [1, 2]],
  ['dense (2^10)', [1]],
  ...EXCESS_FAMILIES.map((f): [string, number[]] => [f.label, [1, 2, 3]]),
]);

/** Relative distance within which a variant's solution is the mapped base solution (measured today: ≤ 1e-14). */
const MAPPED_TOLERANCE = 1e-8;

const rows = [...DENSE_FAMILIES, ...EXCESS_FAMILIES].flatMap((family) =>
  (CI_SEEDS.get(family.label) ?? []).map((seed) => ({ family, seed, label: `${family.label}, seed ${seed}` })),
);

describe.each(rows)('$label', ({ family, seed }) => {
  const base = stressSystem(family, CHANGES[0]!.make(family.unknowns, seed), seed);
  const bezoutExact = family.expected === family.degrees.reduce((p, d) => p * d, 1);

  it.each(CHANGES)('$label: finds every isolated solution, each by one path, with no failed path and every path accounted for', async (change) => {
    const report = await solveOnce(stressSystem(family, change.make(family.unknowns, seed), seed));
    expectEveryPathAccountedFor(report);
    expect({ found: outcome(report).found, failed: report.stats.failed }).toEqual({ found: family.expected, failed: 0 });
    expect(report.solutions.filter((s) => s.multiplicity !== 1)).toHaveLength(0);
    // where Bézout's count is exact, no path may end anywhere but at its own solution
    if (bezoutExact) expect(outcome(report)).toEqual({ found: family.expected, regular: family.expected, singular: 0, excess: 0, atInfinity: 0, failed: 0 });
  });

  it.each(CHANGES.slice(1))('$label: the solutions are exactly the base solutions mapped by the change', async (change) => {
    const s = stressSystem(family, change.make(family.unknowns, seed), seed);
    const [from, to] = await Promise.all([solveOnce(base), solveOnce(s)]);
    const match = compareMapped(from.solutions, to.solutions, s.fromBase, MAPPED_TOLERANCE);
    expect({ unmatchedBase: match.unmatchedBase, unmatchedVariant: match.unmatchedVariant }).toEqual({ unmatchedBase: 0, unmatchedVariant: 0 });
  });
});
