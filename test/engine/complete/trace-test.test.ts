import { describe, expect, it } from 'vitest';
import * as ops from '../../../src/engine/expr/build.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { recoverByLoops } from '../../../src/engine/complete/recover-by-loops.ts';
import { runTraceTest, TRACE_TOLERANCE, type TraceTestReport } from '../../../src/engine/complete/trace-test.ts';
import { apolloniusGeneric, farthest, ladderThirtySix, twoConicsDemo, twoConicsGeneric, twoCubicsGeneric, without, type SolvedInstance } from './fixtures.ts';

function bytes(report: TraceTestReport): string {
  return JSON.stringify(report, (_, v: unknown) => (v instanceof Float64Array ? Buffer.from(v.buffer, v.byteOffset, v.byteLength).toString('hex') : v));
}

/** The 36-conic rung's line moves only the last given conic's six coefficients (its pencil fibre: 36 + 78 points). */
const lastConic = (inst: SolvedInstance): number[] => Array.from({ length: 6 }, (_, k) => inst.system.parameters.length - 6 + k);

const problems: readonly { name: string; load: () => SolvedInstance | Promise<SolvedInstance>; count: number; drop: number[]; moving?: (inst: SolvedInstance) => number[] }[] = [
  { name: 'points common to two conics (4: Bézout 1779; Fulton 1969)', load: twoConicsGeneric, count: 4, drop: [2] },
  { name: 'points common to two conics, real demo (4: Bézout)', load: twoConicsDemo, count: 4, drop: [0, 3] },
  { name: 'points common to two cubics (9: Bézout)', load: twoCubicsGeneric, count: 9, drop: [1, 5, 8] },
  { name: 'circles tangent to three circles (8: Viète 1600; Drechsler–Sterz 1999)', load: apolloniusGeneric, count: 8, drop: [3, 4] },
  { name: 'conics through 3 points tangent to 2 conics (36: Chasles 1864; Bashelor–Ksir–Traves 2008)', load: ladderThirtySix, count: 36, drop: [5, 17, 30], moving: lastConic },
];

describe.each(problems)('the trace test on $name', ({ load, count, drop, moving }) => {
  it(`accepts the complete set of ${count}: linear trace, every solution met again at λ = 0, nothing new`, async () => {
    const inst = await load();
    expect(inst.solutions).toHaveLength(count);
    const report = await runTraceTest(inst.system, inst.parameters, inst.solutions, { seed: 21, moving: moving?.(inst) });
    expect(report.verdict, report.reason).toBe('complete');
    expect(report.defect!).toBeLessThanOrEqual(TRACE_TOLERANCE);
    expect(report.atStart!.solutions).toBe(count);
    expect(report.atStart!.solutions + report.atStart!.hyperplane).toBe(report.pencilFibre);
    expect(report.givenMissed).toBe(0);
    expect(report.recovered).toHaveLength(0);
  });
  it(`recovers exactly the ${drop.length} removed solutions and then says complete; loops (a) find the same`, async () => {
    const inst = await load();
    const { kept, dropped } = without(inst.solutions, drop);
    const report = await runTraceTest(inst.system, inst.parameters, kept, { seed: 22, moving: moving?.(inst) });
    expect(report.verdict, report.reason).toBe('complete');
    expect(farthest(report.recovered.map((r) => r.point), dropped)).toBeLessThan(1e-10);
    // Ten fruitless loops in a row before giving up (see recover-by-loops.test.ts for why small problems need more than 2).
    const loops = await recoverByLoops(compileSystem(inst.system), inst.parameters, kept, { seed: 22, quietLoops: 10 });
    expect(farthest(loops.recovered.map((r) => r.point), report.recovered.map((r) => r.point))).toBeLessThan(1e-12);
  });
  it('refuses the given solutions without completion: their transport alone misses the points on a·X = 0', async () => {
    const inst = await load();
    const report = await runTraceTest(inst.system, inst.parameters, inst.solutions, { seed: 23, moving: moving?.(inst), completion: false });
    expect(report.verdict).toBe('incomplete');
    expect(report.defect!).toBeGreaterThan(1e3 * TRACE_TOLERANCE);
  });
});

describe('the trace test never calls a set with missing solutions complete', () => {
  // Whatever the budget, 'complete' must come with every removed solution recovered.
  it.each([3, 4, 6])('with at most %i λ-nodes, on circles tangent to three circles with two removed', async (maxNodes) => {
    const inst = await apolloniusGeneric();
    const { kept, dropped } = without(inst.solutions, [0, 7]);
    for (const seed of [31, 32, 33]) {
      const report = await runTraceTest(inst.system, inst.parameters, kept, { seed, maxNodes });
      if (report.verdict === 'complete') expect(farthest(report.recovered.map((r) => r.point), dropped)).toBeLessThan(1e-10);
      else expect(report.verdict).toBe('incomplete');
    }
  });
});

describe('trace test determinism and scope', () => {
  it('gives byte-identical reports for the same seed', async () => {
    const inst = await twoCubicsGeneric();
    const { kept } = without(inst.solutions, [2, 6]);
    const [a, b] = [await runTraceTest(inst.system, inst.parameters, kept, { seed: 41 }), await runTraceTest(inst.system, inst.parameters, kept, { seed: 41 })];
    expect(bytes(a)).toBe(bytes(b));
  });
  it("says 'not-applicable' for a system without parameters", async () => {
    const x = ops.unknown('x', 0);
    const report = await runTraceTest({ unknowns: ['x'], parameters: [], equations: [ops.sub(ops.pow(x, 2), 2)] }, new Float64Array(0), [Float64Array.of(Math.SQRT2, 0)], { seed: 1 });
    expect(report.verdict).toBe('not-applicable');
    expect(report.paths).toBe(0);
  });
});
