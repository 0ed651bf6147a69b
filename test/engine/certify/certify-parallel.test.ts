import { afterAll, describe, expect, it } from 'vitest';
import { add, mul, param, pow, sub, unknown } from '../../../src/engine/expr/build.ts';
import type { PolynomialSystem } from '../../../src/engine/expr/node.ts';
import { certifySolutionsParallel, closeCertifyWorkers } from '../../../src/engine/certify/certify-parallel.ts';
import { certifySolutions } from '../../../src/engine/certify/certify-solutions.ts';

// Reference: the single-thread certifier; splitting the work over threads must not change any result.
// The system: x² + y² = a, x² − y² = b, with 4 real points (±√((a+b)/2), ±√((a−b)/2)) for a > |b| (Bézout: 4).
const x = unknown('x', 0), y = unknown('y', 1);
const system: PolynomialSystem = {
  unknowns: ['x', 'y'], parameters: ['a', 'b'],
  equations: [sub(add(pow(x, 2), pow(y, 2)), param('a', 0)), sub(sub(pow(x, 2), pow(y, 2)), param('b', 1))],
};

afterAll(async () => { await closeCertifyWorkers(); });

describe('parallel certification', () => {
  it('gives the same report as one thread on 100 points (4 true solutions, repeats, wrong points)', async () => {
    const [a, b] = [5, 3];
    const u = Math.sqrt((a + b) / 2), v = Math.sqrt((a - b) / 2);
    const truth = [[u, v], [u, -v], [-u, v], [-u, -v]];
    const points = Array.from({ length: 100 }, (_, k) => {
      const [p, q] = truth[k % 4]!;
      const off = k % 10 === 9 ? 0.01 : 0; // every tenth point is wrong
      return Float64Array.from([p! + off, 0, q!, 0]);
    });
    const parameters = Float64Array.from([a, 0, b, 0]);
    const single = certifySolutions(system, parameters, points);
    const parallel = await certifySolutionsParallel(system, parameters, points, { workers: 2 });
    expect([parallel.certified, parallel.certifiedDistinct, parallel.certifiedReal]).toEqual([single.certified, single.certifiedDistinct, single.certifiedReal]);
    expect([parallel.certified, parallel.certifiedDistinct, parallel.certifiedReal]).toEqual([90, 4, 4]);
    expect(parallel.solutions.map((s) => [s.certified, s.certifiedReal, s.sameAs ?? -1, Array.from(s.box)])).toEqual(
      single.solutions.map((s) => [s.certified, s.certifiedReal, s.sameAs ?? -1, Array.from(s.box)]));
  });
});
