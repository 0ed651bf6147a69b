import { describe, expect, it } from 'vitest';
import type { Homotopy } from '../../../src/engine/homotopy.ts';
import { createStepper } from '../../../src/engine/track/stepper.ts';
import { DEFAULT_TRACKER_SETTINGS } from '../../../src/engine/track/settings.ts';

/**
 * H(x, t) = x² − (1 + 3t)·e^{iωt}, one unknown: its path from x = 1 at t = 0 is x(t) = √(1 + 3t)·e^{iωt/2}, ending at
 * 2e^{iω/2} (common practice, no source: a closed-form test path). Counts evaluations.
 */
function spiralPath(w: number): Homotopy & { evaluations: number } {
  const self = {
    n: 1,
    evaluations: 0,
    evaluate(x: Float64Array, t: number, _tIm: number, h: Float64Array, jac: Float64Array, ht: Float64Array): void {
      self.evaluations++;
      const c = Math.cos(w * t), s = Math.sin(w * t), m = 1 + 3 * t;
      h[0] = x[0]! * x[0]! - x[1]! * x[1]! - m * c;
      h[1] = 2 * x[0]! * x[1]! - m * s;
      jac[0] = 2 * x[0]!; jac[1] = 2 * x[1]!;
      ht[0] = -(3 * c - w * m * s); ht[1] = -(3 * s + w * m * c);
    },
  };
  return self;
}

function run(w: number, estimateCorrectorError: boolean): { x: Float64Array; evaluations: number; steps: number; status: string } {
  const homotopy = spiralPath(w);
  const stepper = createStepper(homotopy, { ...DEFAULT_TRACKER_SETTINGS, estimateCorrectorError });
  const x = Float64Array.of(1, 0);
  const status = stepper.segment(x, 0, 0, 1, 0);
  return { x, evaluations: homotopy.evaluations, steps: stepper.steps, status };
}

describe.each([[10, false], [10, true], [40, false], [40, true]])('stepper on the spiral ω = %i (estimateCorrectorError = %s)', (w, estimate) => {
  it('ends at 2e^{iω/2} to 1e-9', () => {
    const { x, status } = run(w, estimate);
    expect(status).toBe('ok');
    expect(x[0]).toBeCloseTo(2 * Math.cos(w / 2), 9);
    expect(x[1]).toBeCloseTo(2 * Math.sin(w / 2), 9);
  });
});

describe('estimateCorrectorError', () => {
  it.each([10, 40])('saves corrector evaluations without changing the steps taken (ω = %i)', (w) => {
    const plain = run(w, false), estimated = run(w, true);
    expect(estimated.steps).toBe(plain.steps);
    expect(estimated.evaluations).toBeLessThan(plain.evaluations);
  });
});
