import { describe, expect, it } from 'vitest';
import conics from '../../../../generators/problems/intersections/points-common-to-two-conics.ts';
import cubics from '../../../../generators/problems/intersections/points-common-to-two-cubics.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { largestResidual, real, type C } from '../shared/evaluate.ts';
import { drawnRealSolutions, demoInstance, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

describe.each([[conics, 2], [cubics, 3]] as const)('%s', (definition, d) => {
  const system = systemOf(definition);

  it('vanishes at a planted common point and nowhere near it', () => {
    // Arbitrary coefficients, constant terms adjusted so that both curves pass through (1, 2).
    const n = system.parameters.length / 2;
    const raw = system.parameters.map((_, m) => Math.sin(3 * m + 1));
    for (const half of [0, n]) {
      let value = 0;
      for (let m = 0; m < n - 1; m++) {
        const [i, j] = system.parameters[half + m]!.slice(1).split('').map(Number) as [number, number];
        value += raw[half + m]! * 1 ** i * 2 ** j;
      }
      raw[half + n - 1] = -value;
    }
    const params: C[] = real(raw);
    expect(largestResidual(system.equations, real([1, 2]), params)).toBeLessThan(1e-12);
    expect(largestResidual(system.equations, real([1.1, 2]), params)).toBeGreaterThan(1e-4);
  });

  it(`draws the demo curves (${d === 2 ? 'as conics' : 'sampled as polylines'})`, () => {
    const demo = definition.instances.find((i) => i.kind === 'demo')!;
    const items = definition.drawing!.configuration(demo.parameters as Record<string, number>);
    expect(items.length).toBeGreaterThanOrEqual(2);
    expect(new Set(items.map((i) => i.shape))).toEqual(new Set([d === 2 ? 'conic' : 'polyline']));
  });
});

// Bézout's theorem (Fulton, Algebraic Curves, 1969): two general plane curves of degrees d and e meet in d·e points.
describe.each([[conics, 4, 'two-running-tracks'], [cubics, 9, 'woven-threads']] as const)('solving %s', (definition, count, demo) => {
  it.each(seeds(20))(`random complex instance %i: ${count} common points, every path regular`, async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed));
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.solutions).toHaveLength(count);
    expect(report.stats).toMatchObject({ tracked: count, regular: count, singular: 0, atInfinity: 0, failed: 0 });
  });

  it(`the demo curves meet in ${count} real points`, async () => {
    const solved = await solveInstance(definition, demoInstance(definition, demo));
    expect(solved.report.solutions).toHaveLength(count);
    expect(solved.real).toBe(count);
    expect(drawnRealSolutions(definition, demoInstance(definition, demo), solved).flat().filter((i) => i.shape === 'point')).toHaveLength(count);
  });
});
