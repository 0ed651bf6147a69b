import { describe, expect, it } from 'vitest';
import * as ops from '../../../src/engine/expr/build.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { COMPILED_LEG_MODULE } from '../../../src/engine/parameter/compiled-leg-module.ts';
import { createModuleLegTracker } from '../../../src/engine/parameter/module-tracker.ts';
import { discoverByMonodromy } from '../../../src/engine/monodromy/discover.ts';
import { createRandom } from '../../../src/engine/random.ts';

// x⁴ + p·x + q = 0: a general quartic has 4 distinct roots (fundamental theorem of algebra; common practice, no source).
const x = ops.unknown('x', 0);
const quartic = compileSystem({ unknowns: ['x'], parameters: ['p', 'q'], equations: [ops.add(ops.pow(x, 4), ops.mul(ops.param('p', 0), x), ops.param('q', 1))] });

async function run(expected?: number, maxNodes = 8) {
  const random = createRandom(3);
  // Solution-first seed: choose x₀ and p, then q = −x₀⁴ − p·x₀ (computed in complex arithmetic).
  const x0 = [0.7, -0.4] as const, pp = [1.1, 0.3] as const;
  const x2 = [x0[0] * x0[0] - x0[1] * x0[1], 2 * x0[0] * x0[1]], x4 = [x2[0]! * x2[0]! - x2[1]! * x2[1]!, 2 * x2[0]! * x2[1]!];
  const px = [pp[0] * x0[0] - pp[1] * x0[1], pp[0] * x0[1] + pp[1] * x0[0]];
  const seed = { parameters: Float64Array.of(pp[0], pp[1], -x4[0]! - px[0]!, -x4[1]! - px[1]!), solution: Float64Array.of(x0[0], x0[1]) };
  const track = await createModuleLegTracker({ url: COMPILED_LEG_MODULE, constants: { source: quartic.source, shape: { neq: 1, n: 1, np: 2 } } });
  return discoverByMonodromy({ track, seed, random, expected, maxNodes });
}

describe('monodromy discovery (Duff et al., IMA J. Numer. Anal. 39, 2019)', () => {
  it('fills the 4 roots of a general quartic from one and stops when loops add nothing', async () => {
    const result = await run();
    expect(result.stop).toBe('saturated');
    expect(result.solutions).toHaveLength(4);
    expect(result.stats.failedPaths).toBe(0);
  });
  it('stops at the known count when it is given', async () => {
    const result = await run(4);
    expect(result.stop).toBe('known-count');
    expect(result.solutions).toHaveLength(4);
  });
  it('sends each solution along each edge at most once', async () => {
    const result = await run();
    // Each of the 4 roots at either end of an edge travels it at most once (jump re-tracks aside: none here).
    expect(result.stats.jumps).toBe(0);
    expect(result.stats.paths).toBeLessThanOrEqual(2 * 4 * result.stats.edges);
  });
});

describe('monodromy discovery with a caller’s seed set, nodes and acceptance test', () => {
  it('starts from several solutions, draws nodes as told, and stops when the acceptance test passes', async () => {
    // x⁴ + 2x − 3 = (x − 1)(x³ + x² + x + 3): the root x = 1 is given twice (kept once); the other three are found.
    const track = await createModuleLegTracker({ url: COMPILED_LEG_MODULE, constants: { source: quartic.source, shape: { neq: 1, n: 1, np: 2 } } });
    const parameters = Float64Array.of(2, 0, -3, 0);
    const drawn: Float64Array[] = [];
    const sizes: number[][] = [];
    const result = await discoverByMonodromy({
      track, random: createRandom(8), seed: { parameters, solutions: [Float64Array.of(1, 0), Float64Array.of(1, 0)] },
      drawNode: (r) => { const q = Float64Array.of(r.normal(), r.normal(), r.normal(), r.normal()); drawn.push(q); return q; },
      accept: (nodes) => { sizes.push(nodes.solutions.map((s) => s.length)); return nodes.solutions[0]!.length === 4; },
    });
    expect(result.stop).toBe('accepted');
    expect(result.solutions).toHaveLength(4);
    expect(sizes.length).toBeGreaterThan(0);
    // At each saturation every node holds the same number of roots (each edge is a bijection), and the seed's
    // duplicate was counted once.
    for (const s of sizes) expect(new Set(s).size).toBe(1);
    expect(drawn.length).toBe(result.stats.nodes - 1);
  });
});
