import { describe, expect, it } from 'vitest';
import * as engine from '../../../src/engine/index.ts';
import { createRandom, exprBuilders } from '../../../src/engine/index.ts';
import { completenessChecks, RECOVERY_LIMIT, TRACE_LIMIT } from '../../../generators/pipeline/completeness-checks.ts';
import { completeFlags } from '../../../generators/pipeline/assemble-instance.ts';

const { add, mul, param, sub, unknown } = exprBuilders;

// Two general conics meet in 2·2 = 4 points (Bézout's theorem; Fulton, Algebraic Curves, 1969): random complex
// coefficients as parameters, so the family is the space of conic pairs.
const x = unknown('x', 0), y = unknown('y', 1);
const names = ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h', 'i', 'j', 'k', 'l'];
const q = names.map((n, i) => param(n, i));
const conic = (o: number) => add(mul(q[o]!, x, x), mul(q[o + 1]!, x, y), mul(q[o + 2]!, y, y), mul(q[o + 3]!, x), mul(q[o + 4]!, y), q[o + 5]!);
const system = { unknowns: ['x', 'y'], parameters: names, equations: [conic(0), conic(6)] };
const parameters = new Float64Array(24);
const random = createRandom(41);
for (let i = 0; i < 12; i++) random.gaussianComplex(parameters, 2 * i);

describe('completeness checks after a solve', () => {
  it('find nothing more on a complete set, and the trace test calls it complete', async () => {
    const report = await engine.solveSystem(system, parameters, { seed: 3 });
    expect(report.solutions).toHaveLength(4);
    const checks = await completenessChecks(engine, system, parameters, report.solutions.map((s) => s.point), 5);
    expect(checks.recovered).toHaveLength(0);
    expect(checks.checks.recovery).toMatchObject({ verdict: 'saturated', recovered: 0 });
    expect(checks.checks.trace.verdict).toBe('complete');
    expect(checks.checks.trace.defect).toBeLessThan(1e-9);
  });

  it('recover a solution left out of the found set, and refine it to a backward error near rounding', async () => {
    const report = await engine.solveSystem(system, parameters, { seed: 3 });
    const kept = report.solutions.slice(1).map((s) => s.point);
    const checks = await completenessChecks(engine, system, parameters, kept, 5);
    expect(checks.recovered).toHaveLength(1);
    expect(checks.recovered[0]!.residual).toBeLessThan(1e-12);
    const missing = report.solutions[0]!.point;
    expect(Math.hypot(checks.recovered[0]!.point[0]! - missing[0]!, checks.recovered[0]!.point[1]! - missing[1]!)).toBeLessThan(1e-8);
  });

  it('says not applicable for a system without parameters', async () => {
    const plain = { unknowns: ['x', 'y'], parameters: [], equations: [sub(mul(x, x), 1), sub(y, 2)] };
    const report = await engine.solveSystem(plain, new Float64Array(0), { seed: 1 });
    const checks = await completenessChecks(engine, plain, new Float64Array(0), report.solutions.map((s) => s.point), 1);
    expect(checks.checks.recovery.verdict).toBe('not-applicable');
    expect(checks.checks.trace.verdict).toBe('not-applicable');
  });

  it('keeps the limits in the order the budget needs (the trace test is the dearer check)', () => {
    expect(TRACE_LIMIT).toBeLessThan(RECOVERY_LIMIT);
  });
});

describe('the completeness flag of an instance', () => {
  it.each([
    ['generic, published 4, 4 certified distinct', 'generic', 4, 4, 4, undefined, { complete: true, completeBy: 'published count' }],
    ['generic, published 4, 3 certified distinct', 'generic', 4, 3, 4, 'complete', { complete: false, completeBy: null }],
    ['generic, no count, trace complete, all certified', 'generic', null, 7, 7, 'complete', { complete: true, completeBy: 'trace test' }],
    ['generic, no count, trace complete, one uncertified', 'generic', null, 6, 7, 'complete', { complete: false, completeBy: null }],
    ['generic, no count, trace not confirmed', 'generic', null, 7, 7, 'incomplete', { complete: false, completeBy: null }],
    ['demo, published 4, 4 certified distinct', 'demo', 4, 4, 4, 'complete', { complete: false, completeBy: null }],
  ] as const)('%s', (_, kind, count, distinct, found, trace, expected) => {
    expect(completeFlags(kind, count, distinct, found, trace)).toEqual(expected);
  });
});
