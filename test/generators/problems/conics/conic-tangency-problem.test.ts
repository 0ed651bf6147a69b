import { describe, expect, it } from 'vitest';
import { validateDefinition } from '../../../../src/atlas/validate-definition.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../../src/atlas/parameters-of.ts';
import { figureItemSchema } from '../../../../src/atlas/figure.ts';
import { bezoutBound, compileSystem, createRandom, randomParameterPoint, solveByParameterHomotopy } from '../../../../src/engine/index.ts';
import { conicLadderSlug, CONIC_LADDER } from '../../../../generators/problems/conics/conic-tangency-problem.ts';
import { ellipseCoefficients, tangencyPoint } from '../../../../generators/problems/conics/conic-geometry.ts';
import five from '../../../../generators/problems/conics/conics-tangent-to-5-conics.ts';
import one from '../../../../generators/problems/conics/conics-through-1-point-tangent-to-4-conics.ts';
import two from '../../../../generators/problems/conics/conics-through-2-points-tangent-to-3-conics.ts';
import three from '../../../../generators/problems/conics/conics-through-3-points-tangent-to-2-conics.ts';
import four from '../../../../generators/problems/conics/conics-through-4-points-tangent-to-1-conic.ts';

const rungs = [[0, five], [1, one], [2, two], [3, three], [4, four]] as const;

describe.each(rungs)('the rung with %i points', (points, definition) => {
  it('has its permanent slug and passes the definition validator', () => {
    expect(definition.slug).toBe(conicLadderSlug(points));
    expect(validateDefinition(definition).issues).toEqual([]);
  });
  // Bézout bound of the shown formulation: chart and point conditions linear, each tangency a sextic (our own
  // derivation; REFERENCES.md lists 1, 6, 36, 216, 1296, 7776), read off the graph's degrees.
  it(`has the naive count 6^${5 - points} read off the degrees`, () => {
    expect(bezoutBound(systemOf(definition))).toBe(6 ** (5 - points));
  });
  it('has a real demo instance whose given conics are drawn as conics', () => {
    const demo = definition.instances.find((i) => i.kind === 'demo')!;
    const p = parametersOf(definition, demo);
    const q = Object.fromEntries(definition.formulation.parameters.map((name, j) => [name, p[2 * j]!]));
    const items = definition.drawing!.configuration(q);
    expect(items.filter((i) => i.shape === 'conic')).toHaveLength(5 - points);
    items.forEach((i) => expect(figureItemSchema.safeParse(i).success).toBe(true));
  });
});

describe('the two formulations agree', () => {
  it('the solved conics (tangency-point form) satisfy the shown sextic equations (Salmon’s tact-invariant)', async () => {
    const solver = three.solver;
    if (solver?.kind !== 'parameter-homotopy') throw new Error('expected a parameter homotopy');
    const shown = systemOf(three);
    const target = randomParameterPoint(shown.parameters.length, createRandom(8));
    const report = await solveByParameterHomotopy(await solver.prepare(shown), target, { seed: 2 });
    expect(report.solutions).toHaveLength(CONIC_LADDER[3]!);
    const compiled = compileSystem(shown), v = new Float64Array(2 * shown.equations.length);
    for (const s of report.solutions) {
      compiled.evaluate(s.point, target, v, null, null);
      const size = Math.max(1, ...Array.from(s.point, Math.abs));
      expect(Math.max(...Array.from(v, Math.abs)) / size ** 6).toBeLessThan(1e-8);
    }
  });
});

describe('points of contact for the drawing', () => {
  it.each([
    ['two unit circles side by side touch at (1, 0)', [1, 0, 1, 0, 0, -1], [1, 0, 1, -4, 0, 3], [1, 0]],
    ['a circle inside an ellipse touch at (2, 0)', [1, 0, 1, -2, 0, 0], ellipseCoefficients(0, 0, 2, 3, 0), [2, 0]],
  ] as const)('%s', (_, u, given, expected) => {
    const p = tangencyPoint(u, given)!;
    expect(p[0]).toBeCloseTo(expected[0], 6);
    expect(p[1]).toBeCloseTo(expected[1], 6);
  });
  it('returns null for conics that do not touch at a real finite point', () => {
    expect(tangencyPoint([1, 0, 1, 0, 0, -1], [1, 0, 1, 0, 0, -4])).toBeNull();
  });
});
