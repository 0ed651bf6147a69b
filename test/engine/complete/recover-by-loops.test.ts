import { describe, expect, it } from 'vitest';
import * as ops from '../../../src/engine/expr/build.ts';
import { compileSystem } from '../../../src/engine/compile/compile-system.ts';
import { recoverByLoops, type LoopRecoveryReport } from '../../../src/engine/complete/recover-by-loops.ts';
import { apolloniusGeneric, farthest, ladderThirtySix, twoConicsDemo, twoCubicsGeneric, without, type SolvedInstance } from './fixtures.ts';

/** The report as bytes: every number and every coordinate's bits, so that equal strings mean byte-identical reports. */
function bytes(report: LoopRecoveryReport): string {
  return JSON.stringify(report, (_, v: unknown) => (v instanceof Float64Array ? Buffer.from(v.buffer, v.byteOffset, v.byteLength).toString('hex') : v));
}

// quietLoops: on 4–9 solutions a loop often leaves the missing ones where they are, so the default two fruitless loops
// in a row can stop early; measured over 21 seeds on the circles: up to 5 fruitless loops before the last one was
// found, so small problems get 10 here.
const cases: readonly { name: string; load: () => SolvedInstance | Promise<SolvedInstance>; count: number; drop: number[]; quietLoops?: number }[] = [
  { name: 'points common to two conics, real demo (4: Bézout 1779; Fulton 1969)', load: twoConicsDemo, count: 4, drop: [1, 3], quietLoops: 10 },
  { name: 'points common to two cubics (9: Bézout)', load: twoCubicsGeneric, count: 9, drop: [0, 4, 7], quietLoops: 10 },
  { name: 'circles tangent to three circles (8: Viète 1600; Drechsler–Sterz 1999)', load: apolloniusGeneric, count: 8, drop: [2, 5], quietLoops: 10 },
  { name: 'conics through 3 points tangent to 2 conics (36: Chasles 1864; Bashelor–Ksir–Traves 2008)', load: ladderThirtySix, count: 36, drop: [0, 10, 20, 35] },
];

describe.each(cases)('recoverByLoops on $name', ({ load, count, drop, quietLoops }) => {
  it(`finds the ${drop.length} removed solutions again, and nothing else`, async () => {
    const inst = await load();
    expect(inst.solutions).toHaveLength(count);
    const { kept, dropped } = without(inst.solutions, drop);
    const report = await recoverByLoops(compileSystem(inst.system), inst.parameters, kept, { seed: 3, quietLoops });
    expect(report.verdict).toBe('saturated');
    expect(report.given).toBe(count - drop.length);
    expect(farthest(report.recovered.map((r) => r.point), dropped)).toBeLessThan(1e-10);
    expect(report.rejected).toBe(0);
    expect(report.failedPaths).toBe(0);
    for (const r of report.recovered) expect(r.residual).toBeLessThan(1e-12);
    // Counts add up over the loops; the last quietLoops found nothing.
    expect(report.paths).toBe(report.perLoop.reduce((s, l) => s + l.paths, 0));
    expect(report.perLoop.slice(-(quietLoops ?? 2)).every((l) => l.added === 0)).toBe(true);
  });
  it('finds nothing new in the complete set', async () => {
    const inst = await load();
    const report = await recoverByLoops(compileSystem(inst.system), inst.parameters, inst.solutions, { seed: 4, quietLoops });
    expect(report.recovered).toHaveLength(0);
    expect(report.loops).toBe(quietLoops ?? 2);
  });
});

describe('recoverByLoops determinism and scope', () => {
  it('gives byte-identical reports for the same seed', async () => {
    const inst = await apolloniusGeneric();
    const { kept } = without(inst.solutions, [1, 6]);
    const compiled = compileSystem(inst.system);
    const [a, b] = [await recoverByLoops(compiled, inst.parameters, kept, { seed: 9 }), await recoverByLoops(compiled, inst.parameters, kept, { seed: 9 })];
    expect(bytes(a)).toBe(bytes(b));
  });
  it("says 'not-applicable' for a system without parameters", async () => {
    const x = ops.unknown('x', 0);
    const compiled = compileSystem({ unknowns: ['x'], parameters: [], equations: [ops.sub(ops.pow(x, 2), 2)] });
    const report = await recoverByLoops(compiled, new Float64Array(0), [Float64Array.of(Math.SQRT2, 0)], { seed: 1 });
    expect(report.verdict).toBe('not-applicable');
    expect(report.paths).toBe(0);
  });
  it('stops at the loop budget', async () => {
    const inst = await twoCubicsGeneric();
    const report = await recoverByLoops(compileSystem(inst.system), inst.parameters, inst.solutions.slice(0, 1), { seed: 2, maxLoops: 1 });
    expect(report.loops).toBe(1);
    expect(report.verdict).toBe('loop-budget');
  });
});
