import { describe, expect, it } from 'vitest';
import { compiledLegTracker } from '../../../src/engine/complete/compiled-leg-tracker.ts';
import { completePencilFibre, transportDefect } from '../../../src/engine/complete/pencil-fibre.ts';
import { createTracePencil } from '../../../src/engine/complete/trace-pencil.ts';
import { TRACE_TOLERANCE } from '../../../src/engine/complete/trace-test.ts';
import { randomGamma } from '../../../src/engine/parameter/route.ts';
import { createRandom } from '../../../src/engine/random.ts';
import { twoConicsGeneric, twoCubicsGeneric, type SolvedInstance } from './fixtures.ts';

/** The given solutions carried from λ = 0 to a random λ₁, and the pencil's fibre completed there. */
async function completed(inst: SolvedInstance, seed: number) {
  const random = createRandom(seed);
  const pencil = createTracePencil(inst.system, inst.parameters, inst.solutions, random, 'generic');
  const track = await compiledLegTracker(pencil.compiled);
  const lambda1 = new Float64Array(2);
  random.gaussianComplex(lambda1, 0);
  const ends = await track({ from: new Float64Array(2), to: lambda1, gamma: randomGamma(random) }, inst.solutions.map((x) => pencil.lift(x)), false);
  const completion = await completePencilFibre(pencil, track, ends.map((e) => e.point), lambda1, random, { tolerance: TRACE_TOLERANCE, maxNodes: 60, quietNodes: 20, maxPaths: 100_000, sameTolerance: 1e-8 });
  return { pencil, track, lambda1, random, completion };
}

// d + e: d the solutions (Bézout: 4 for two conics, 9 for two cubics), e the points of the curve on a·X = 0: the line
// a·X = 0 of P² times the s-line, two equations of bidegree (k, 1) on P¹ × P¹, k·1 + 1·k = 2k (our own working, [derived]).
describe.each([
  { name: 'two conics', load: twoConicsGeneric, d: 4, e: 4 },
  { name: 'two cubics', load: twoCubicsGeneric, d: 9, e: 6 },
])('completing the pencil fibre of $name', ({ load, d, e }) => {
  it(`reaches d + e = ${d} + ${e} points with a linear trace (defect ≤ ${TRACE_TOLERANCE})`, async () => {
    const inst = await load();
    expect(inst.solutions).toHaveLength(d);
    const { completion } = await completed(inst, 11);
    expect(completion.linear).toBe(true);
    expect(completion.fibre).toHaveLength(d + e);
    expect(completion.defects[completion.defects.length - 1]!).toBeLessThanOrEqual(TRACE_TOLERANCE);
    // Before the last saturation the fibre was incomplete, and the trace said so.
    for (const defect of completion.defects.slice(0, -1)) expect(defect === null || defect > 1e3 * TRACE_TOLERANCE).toBe(true);
  });
  it('refuses the completed fibre with any one point removed (raw trace verdict, no completion)', async () => {
    const inst = await load();
    const { pencil, track, lambda1, random, completion } = await completed(inst, 12);
    expect(completion.fibre).toHaveLength(d + e);
    const whole = await transportDefect(pencil, track, completion.fibre, lambda1, random);
    expect(whole.defect!).toBeLessThanOrEqual(TRACE_TOLERANCE);
    for (let i = 0; i < completion.fibre.length; i++) {
      const raw = await transportDefect(pencil, track, completion.fibre.filter((_, j) => j !== i), lambda1, random);
      expect(raw.failedPaths).toBe(0);
      expect(raw.defect!).toBeGreaterThan(1e3 * TRACE_TOLERANCE);
    }
  });
});
