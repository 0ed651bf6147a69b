import { describe, expect, it } from 'vitest';
import definition from '../../../../generators/problems/rational-curves/rational-cubics-through-8-points.ts';
import { systemOf } from '../../../../src/atlas/system-of.ts';
import { largestResidual, paramsFrom, real } from '../shared/evaluate.ts';
import { demoInstance, drawnRealSolutions, randomInstance, seeds, solveInstance, worstResidual } from '../shared/solve.ts';

const system = systemOf(definition);

// The nodal cubic x³ + x² − y² = 0 (node at the origin), traced by t ↦ (t² − 1, t(t² − 1)); eight of its points.
const onCurve = [-2, -1.5, -0.5, 0.3, 0.7, 1.4, 1.8, 2.2].map((t) => [t * t - 1, t * (t * t - 1)]);
const q = Object.fromEntries(onCurve.flatMap(([x, y], i) => [[`px${i + 1}`, x!], [`py${i + 1}`, y!]]));
// Unknowns c21, c12, c03, c20, c11, c02, c10, c01, c00, then the node x, y.
const planted = [0, 0, 0, 1, 0, -1, 0, 0, 0, 0, 0];

describe('rational cubics through 8 points: the formulation', () => {
  it('is satisfied by a planted nodal cubic and its node, and not with the node moved', () => {
    const params = paramsFrom(system.parameters, q);
    expect(largestResidual(system.equations, real(planted), params)).toBeLessThan(1e-12);
    expect(largestResidual(system.equations, real(planted.map((v, i) => (i === 9 ? 0.1 : v))), params)).toBeGreaterThan(1e-3);
  });

  it('is not satisfied at a smooth point of the same cubic', () => {
    const [x, y] = [0.5 * 0.5 - 1, 0.5 * (0.5 * 0.5 - 1)]; // t = 1/2: on the curve, not its node
    const params = paramsFrom(system.parameters, q);
    expect(largestResidual(system.equations, real([...planted.slice(0, 9), x, y]), params)).toBeGreaterThan(1e-3);
  });
});

// Twelve rational cubics pass through eight general points: N_3 = 12 (Kontsevich–Manin, Comm. Math. Phys. 164, 1994).
describe('solving rational cubics through 8 points', () => {
  it.each(seeds(8))('random complex instance %i, two-homogeneous: 12 cubics on 12 paths', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed), 'multihomogeneous');
    expect(worstResidual(report)).toBeLessThan(1e-8);
    expect(report.multihomogeneousBound).toBe(12);
    expect(report.solutions).toHaveLength(12);
    expect(report.stats).toMatchObject({ tracked: 12, regular: 12, failed: 0 });
  });

  it.each(seeds(3))('random complex instance %i, total degree: 12 cubics, the other 15 of 27 paths at infinity', async (seed) => {
    const { report } = await solveInstance(definition, randomInstance(seed), 'total-degree');
    expect(report.solutions).toHaveLength(12);
    expect(report.stats).toMatchObject({ tracked: 27, regular: 12, atInfinity: 15, failed: 0 });
  });

  it('the garden hose: all 12 cubics real, each drawn with its node', async () => {
    // At most 12 real (the complex count); at least 8 always (Welschinger; Itenberg–Kharlamov–Shustin 2003, from memory).
    const instance = demoInstance(definition, 'garden-hose');
    const solved = await solveInstance(definition, instance);
    expect(solved.report.solutions).toHaveLength(12);
    expect(solved.real).toBe(12);
    const drawn = drawnRealSolutions(definition, instance, solved);
    drawn.forEach((items) => {
      expect(items.filter((i) => i.layer === 'solution').length).toBeGreaterThan(0);
      expect(items.filter((i) => i.layer === 'node')).toHaveLength(1);
    });
  });
});
