import { describe, expect, it } from 'vitest';
import * as engine from '../../../src/engine/index.ts';
import { systemOf } from '../../../src/atlas/system-of.ts';
import { parametersOf } from '../../../src/atlas/parameters-of.ts';
import { monodromyGroupOf } from '../../../generators/pipeline/monodromy-group-of.ts';
import linesOnACubicSurface from '../../../generators/problems/surfaces/lines-on-a-cubic-surface.ts';
import bitangents from '../../../generators/problems/plane-curves/bitangents-of-a-plane-quartic.ts';
import flexes from '../../../generators/problems/plane-curves/flexes-of-a-plane-cubic.ts';
import twoCubics from '../../../generators/problems/intersections/points-common-to-two-cubics.ts';
import fourLines from '../../../generators/problems/schubert/lines-meeting-four-lines.ts';
import { curvePairProblem } from '../../../generators/problems/intersections/curve-pair.ts';
import type { ProblemDefinition } from '../../../src/atlas/definition.ts';
import { randomInstance } from '../problems/shared/solve.ts';

const factorial = (n: number): string => { let f = 1n; for (let k = 2n; k <= BigInt(n); k++) f *= k; return f.toString(); };

// Published monodromy (Galois) groups of classical problems, checked by the order of the group that random loops
// generate (Schreier–Sims), which equals the published order when the loops generate the whole group:
const published: readonly { definition: ProblemDefinition; degree: number; order: string; source: string }[] = [
  // C. Jordan, Traité des substitutions et des équations algébriques, Paris 1870: the 27 lines, W(E₆) of order 51840
  { definition: linesOnACubicSurface, degree: 27, order: '51840', source: 'Jordan 1870 (W(E₆))' },
  // Jordan 1870; J. Harris, Galois groups of enumerative problems, Duke Math. J. 46 (1979) 685–724: the 28
  // bitangents, Sp(6, F₂) of order 1451520
  { definition: bitangents, degree: 28, order: '1451520', source: 'Jordan 1870; Harris 1979 (Sp(6, 2))' },
  // Harris 1979: the 9 flexes of a plane cubic, the affine group of (Z/3)² preserving the Weil pairing, order 216
  // (the section in Harris's paper from memory)
  { definition: flexes, degree: 9, order: '216', source: 'Harris 1979 (order 216)' },
  // Harris 1979: the points common to two general plane curves have the full symmetric group (here S₉)
  { definition: twoCubics, degree: 9, order: factorial(9), source: 'Harris 1979 (S₉)' },
  // two lines meet four general lines in 3-space; the loop exchanging them makes the group S₂ (Harris 1979)
  { definition: fourLines, degree: 2, order: '2', source: 'Harris 1979 (S₂)' },
];

describe('monodromy groups of classical problems match the published groups', () => {
  it.each(published)('$source: order $order on $degree solutions', async ({ definition, degree, order }) => {
    const instance = randomInstance(5);
    const system = systemOf(definition);
    const parameters = parametersOf(definition, instance);
    const report = await engine.solveSystem(system, parameters, { seed: 5, start: definition.solver?.kind === 'multihomogeneous' ? 'multihomogeneous' : 'total-degree' });
    expect(report.solutions).toHaveLength(degree);
    const group = await monodromyGroupOf(engine, system, parameters, report.solutions.map((s) => s.point), 11);
    expect(group.degree).toBe(degree);
    expect(group.closedLoops).toBeGreaterThanOrEqual(2);
    expect(group.transitive).toBe(true);
    expect(group.order).toBe(order);
    expect(definition.publishedGroup?.order).toBe(order); // the page shows the same published order
  }, 120_000);
});

// Above 64 solutions no order is computed: Jordan's test decides (Hauenstein–Rodriguez–Sottile, Math. Comp. 87, 2018).
// Harris 1979 (Duke Math. J. 46): the d² points common to two general plane curves of degree d have the full
// symmetric group; for d = 9 that is S₈₁, and the loops must prove it.
const nonics = curvePairProblem({
  slug: 'test-two-nonics', degree: 9, noun: 'nonic', genericSeed: 3, view: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 },
  demo: { id: 'unused', label: 'unused', description: 'unused', p: Array(55).fill(1), q: Array(55).fill(1) },
});

describe('monodromy groups above the exact-order limit', () => {
  it('proves S₈₁ for the 81 points common to two general nonics (Harris 1979) by Jordan’s theorem, stopping at the first round that proves it', async () => {
    const system = systemOf(nonics);
    const parameters = parametersOf(nonics, randomInstance(9));
    const report = await engine.solveSystem(system, parameters, { seed: 9, start: 'total-degree' });
    expect(report.solutions).toHaveLength(81);
    const group = await monodromyGroupOf(engine, system, parameters, report.solutions.map((s) => s.point), 4);
    expect(group).toMatchObject({ degree: 81, order: null, verdict: 'symmetric', transitive: true, primitive: true, oddLoop: true });
    expect(group.primeCycle).toBeGreaterThan(1);
    expect(group.primeCycle).toBeLessThanOrEqual(78);
    expect(group.loops % 2).toBe(0);
    expect(group.loops).toBeLessThanOrEqual(8);
  }, 120_000);

  it('walks rounds of two loops and stops once the verdict is symmetric', async () => {
    const n = 70;
    const cycle = Int32Array.from({ length: n }, (_, i) => (i + 1) % n); // a 70-cycle: transitive, odd
    const fixFive = Int32Array.from({ length: n }, (_, i) => (i < 67 ? (i + 1) % 67 : i)); // a 67-cycle, 67 ≤ n − 3 prime
    let calls = 0;
    const walk = async (_c: unknown, _p: unknown, _x: unknown, o: { loops: number }) => {
      calls++;
      return { permutations: calls === 1 ? [cycle, cycle] : Array.from({ length: o.loops }, () => fixFive) };
    };
    const fake = { compileSystem: engine.compileSystem, describeGroup: engine.describeGroup, monodromyPermutations: walk } as unknown as Parameters<typeof monodromyGroupOf>[0];
    const system = { unknowns: ['x'], parameters: [], equations: [engine.exprBuilders.unknown('x', 0)] };
    const group = await monodromyGroupOf(fake, system, new Float64Array(0), Array.from({ length: n }, () => new Float64Array(2)), 3);
    expect(group).toMatchObject({ loops: 4, closedLoops: 4, verdict: 'symmetric', primeCycle: 67, order: null });
    expect(calls).toBe(2);
  });
});

describe('the group block of a record', () => {
  it('walks rounds until 8 loops closed (half of each round closes: 8 + 4 + 2 + 1 walked), keeps at most 8 cycle types, and says symmetric when the order is n!', async () => {
    const perms = [Int32Array.from([1, 2, 0]), Int32Array.from([1, 0, 2])];
    // a stand-in engine on which every other loop of a round closes (loops 0, 2, 4, … of each round)
    const walk = async (_c: unknown, _p: unknown, _x: unknown, o: { loops: number }) => ({
      permutations: Array.from({ length: Math.ceil(o.loops / 2) }, (_, k) => perms[k % 2]!),
    });
    const fake = {
      compileSystem: engine.compileSystem,
      describeGroup: engine.describeGroup,
      monodromyPermutations: walk,
    } as unknown as Parameters<typeof monodromyGroupOf>[0];
    const system = { unknowns: ['x'], parameters: [], equations: [engine.exprBuilders.unknown('x', 0)] };
    const group = await monodromyGroupOf(fake, system, new Float64Array(0), [new Float64Array(2), new Float64Array(2), new Float64Array(2)], 3);
    expect(group).toMatchObject({ seed: 3, loops: 15, closedLoops: 8, degree: 3, order: '6', verdict: 'symmetric', transitive: true, oddLoop: true });
    expect(group.cycleTypes.length).toBeLessThanOrEqual(8);
  });
});
