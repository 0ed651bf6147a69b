import { describe, expect, it } from 'vitest';
import type { ProblemDefinition } from '../../../../src/atlas/definition.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { createRandom } from '../../../../src/engine/index.ts';
import { chartUnknowns, conditionCount, subspaceParameters, type SchubertShape } from '../../../../generators/problems/schubert/schubert-chart.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { demoInstance, drawnRealSolutions, randomInstance, solveInstance, worstResidual } from '../shared/solve.ts';

/**
 * Given subspaces planted through points of a chosen solution [I | X]: subspace j passes through the solution's
 * point row₁ + Σ t_r row_r (a random affine point of it) shifted along its own random directions, so the chosen X meets all.
 */
function plantedConfiguration(shape: SchubertShape, X: readonly (readonly number[])[], seed: number): Record<string, number> {
  const random = createRandom(seed);
  const { k } = shape;
  const q: Record<string, number> = {};
  for (let j = 1; j <= conditionCount(shape); j++) {
    const t = Array.from({ length: k - 1 }, () => random.normal());
    // Affine coordinates 1 … n − 1 of row₁ + Σ t_r row_r: first the identity part (t), then X's combination.
    const onSolution = [...t, ...X[0]!.map((v, c) => v + t.reduce((s, tr, r) => s + tr * X[r + 1]![c]!, 0))];
    const { point, directions } = subspaceParameters(shape, j);
    const dirs = directions.map((names) => names.map(() => random.normal()));
    const shift = dirs.map(() => random.normal());
    point.forEach((name, i) => (q[name] = onSolution[i]! + dirs.reduce((s, d, m) => s + shift[m]! * d[i]!, 0)));
    directions.forEach((names, m) => names.forEach((name, i) => (q[name] = dirs[m]![i]!)));
  }
  return q;
}

/** What a Schubert page's test checks: its shape, the published count and the seeds to solve. */
export interface SchubertCase {
  readonly definition: ProblemDefinition;
  readonly shape: SchubertShape;
  /** The published count (its source named beside the value in the calling test). */
  readonly published: number;
  readonly totalDegree: number;
  readonly rowGroupBound: number;
  readonly seeds: readonly number[];
  readonly totalDegreeSeeds: readonly number[];
  readonly demo: string;
  /** Path seeds for the demo, the recorded one first. */
  readonly demoSeeds: readonly number[];
}

/** The specification every Schubert page meets: formulation planted-solution check, bounds, counts over seeds, real demo. */
export function describeSchubertPage(c: SchubertCase): void {
  const system = systemOf(c.definition);
  const X = chartUnknowns(c.shape).map((row, r) => row.map((_, col) => 0.3 * (r + 1) - 0.2 * col + 0.1 * r * col));

  describe(`${c.definition.slug}: the formulation`, () => {
    it.each([1, 2, 3])('is satisfied by a solution planted through random subspaces (seed %i) and not by a nearby one', (seed) => {
      const params = paramsFrom(system.parameters, plantedConfiguration(c.shape, X, seed));
      expect(largestResidual(system.equations, real(X.flat()), params)).toBeLessThan(1e-10);
      const nearby = X.flat().map((v, i) => (i === 0 ? v + 0.1 : v));
      expect(largestResidual(system.equations, real(nearby), params)).toBeGreaterThan(1e-4);
    });

    it('has one variable group per row of X, of size n − k', () => {
      expect(system.groups?.map((g) => g.length)).toEqual(Array.from({ length: c.shape.k }, () => c.shape.n - c.shape.k));
    });
  });

  describe(`${c.definition.slug}: solving`, () => {
    it.each([...c.seeds])(`random complex instance %i, rows as groups: ${c.published} solutions, the rest at infinity, none failed`, async (seed) => {
      const { report } = await solveInstance(c.definition, randomInstance(seed), 'multihomogeneous');
      expect(report.bezoutBound).toBe(c.totalDegree);
      expect(report.multihomogeneousBound).toBe(c.rowGroupBound);
      expect(worstResidual(report)).toBeLessThan(1e-8);
      expect(report.solutions).toHaveLength(c.published);
      expect(report.stats).toMatchObject({ tracked: c.rowGroupBound, regular: c.published, singular: 0, failed: 0, atInfinity: c.rowGroupBound - c.published });
    });

    if (c.totalDegreeSeeds.length > 0) it.each([...c.totalDegreeSeeds])(`random complex instance %i, total degree: ${c.published} solutions, none failed`, async (seed) => {
      const { report } = await solveInstance(c.definition, randomInstance(seed), 'total-degree');
      expect(report.solutions).toHaveLength(c.published);
      expect(report.stats).toMatchObject({ tracked: c.totalDegree, regular: c.published, failed: 0 });
    });

    it.each([...c.demoSeeds])(`the demo "${c.demo}" (subspaces osculating the moment curve), path seed %i: all ${c.published} solutions real and drawn`, async (seed) => {
      // All real: the Shapiro conjecture, proved by Mukhin–Tarasov–Varchenko, Annals of Mathematics 170 (2009), from memory.
      const instance = { ...demoInstance(c.definition, c.demo), seed };
      const solved = await solveInstance(c.definition, instance);
      expect(solved.report.solutions).toHaveLength(c.published);
      expect(solved.real).toBe(c.published);
      const drawn = drawnRealSolutions(c.definition, instance, solved);
      expect(drawn).toHaveLength(c.published);
      drawn.forEach((items) => {
        expect(items.filter((i) => i.layer === 'solution')).toHaveLength(1);
        // Lines show every meeting point; planes the three corners of their triangle on the first, middle and last given subspaces.
        expect(items.filter((i) => i.layer === 'intersection')).toHaveLength(c.shape.k === 3 ? 3 : conditionCount(c.shape));
      });
    });
  });
}
