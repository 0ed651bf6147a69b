import { describe, expect, it } from 'vitest';
import { exprBuilders as ops } from '../../../../src/engine/index.ts';
import { chartLineExpr, chartLinePoints } from '../../../../generators/problems/shared/line-chart.ts';
import { evaluate, type C } from './evaluate.ts';

const frame = [[1, 0.5, 0, -0.25], [0, 2, 1, 0], [0.5, 0, 1, 1], [0, 0, -1, 3]];
const values: C[] = [[0.3, -1], [2, 0.5], [-0.7, 0.2], [1.5, 1]];

// The chart of lines in P³: the span of frame·(1, 0, u₀, u₁) and frame·(0, 1, u₂, u₃) (our own convention, checked
// against the matrix product written out).
describe('the chart of lines through a frame', () => {
  const x = values.map(([re]) => re);
  it.each([0, 1, 2, 3])('coordinate %i: p and q are the frame times the chart points', (i) => {
    const p = frame[i]![0]! + frame[i]![2]! * x[0]! + frame[i]![3]! * x[1]!;
    const q = frame[i]![1]! + frame[i]![2]! * x[2]! + frame[i]![3]! * x[3]!;
    const u = values.map((_, k) => ops.unknown(`u${k}`, k));
    const [pe, qe] = chartLineExpr(ops, frame, u)[i]!;
    expect(evaluate(pe!, values, [])[0]).toBeCloseTo(p, 12);
    expect(evaluate(qe!, values, [])[0]).toBeCloseTo(q, 12);
    // the imaginary parts follow the frame linearly as well
    expect(evaluate(pe!, values, [])[1]).toBeCloseTo(frame[i]![2]! * values[0]![1] + frame[i]![3]! * values[1]![1], 12);
    const numeric = chartLinePoints(frame, Float64Array.from(values.flat()));
    expect(numeric.p[2 * i]).toBeCloseTo(p, 12);
    expect(numeric.q[2 * i]).toBeCloseTo(q, 12);
    expect(numeric.q[2 * i + 1]).toBeCloseTo(frame[i]![2]! * values[2]![1] + frame[i]![3]! * values[3]![1], 12);
  });

  it('refuses the wrong number of unknowns', () => {
    expect(() => chartLineExpr(ops, frame, [ops.unknown('a', 0)])).toThrow(/expected 4 unknowns/);
  });
});
