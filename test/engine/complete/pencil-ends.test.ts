import { describe, expect, it } from 'vitest';
import type { PathEnd } from '../../../src/engine/homotopy.ts';
import { sortStartEnds } from '../../../src/engine/complete/pencil-ends.ts';
import { createTracePencil } from '../../../src/engine/complete/trace-pencil.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { twoConicsGeneric } from './fixtures.ts';

const end = (point: Float64Array, outcome: PathEnd['outcome'] = 'regular'): PathEnd => ({ outcome, point, residual: 0, condition: 1, windingNumber: 1, steps: 1, rejectedSteps: 0, retries: 0 });

describe('sortStartEnds: where the fibre lands at λ = 0 (common practice, no source)', () => {
  it('tells solutions (s = 0), the hyperplane part (a·X = 0), points at infinity (h = 0), unclear and failed ends apart', async () => {
    const inst = await twoConicsGeneric();
    const pencil = createTracePencil(inst.system, inst.parameters, inst.solutions, createRandom(3), 'generic');
    const n = pencil.n, a = pencil.choices.hyperplane;
    const lifted = pencil.lift(inst.solutions[0]!);
    // A point with a·X = 0 and s = 0.7: move X along coordinate 0 until a·X vanishes.
    const onA = lifted.slice();
    onA[2 * n + 2] = 0.7;
    let axr = 0, axi = 0;
    for (let i = 0; i <= n; i++) { axr += a[2 * i]! * onA[2 * i]! - a[2 * i + 1]! * onA[2 * i + 1]!; axi += a[2 * i]! * onA[2 * i + 1]! + a[2 * i + 1]! * onA[2 * i]!; }
    const d = a[0]! * a[0]! + a[1]! * a[1]!, qr = (axr * a[0]! + axi * a[1]!) / d, qi = (axi * a[0]! - axr * a[1]!) / d;
    onA[0] = onA[0]! - qr; onA[1] = onA[1]! - qi;
    const atInfinity = lifted.slice(); atInfinity[2 * n] = 0; atInfinity[2 * n + 1] = 0;
    const neither = lifted.slice(); neither[2 * n + 2] = 0.3;
    const both = onA.slice(); both[2 * n + 2] = 0; both[2 * n + 3] = 0;
    const { fibre, affine } = sortStartEnds(pencil, [end(lifted), end(onA), end(atInfinity), end(neither), end(both), end(lifted, 'failed'), end(lifted, 'singular')]);
    expect(fibre).toEqual({ solutions: 1, hyperplane: 1, atInfinity: 1, unclear: 2, failed: 2 });
    expect(affine).toHaveLength(1);
    for (let i = 0; i < 2 * n; i++) expect(affine[0]![i]!).toBeCloseTo(inst.solutions[0]![i]!, 12);
  });
});
