import { describe, expect, it } from 'vitest';
import { evaluate } from '../../../../generators/problems/shared/numeric-polynomial.ts';
import { ovalCubicForm } from '../../../../generators/problems/shared/oval-cubic-form.ts';

const roots = [-1.8, -1.2, -0.8] as const;
const [angle, cx, cy] = [2.1, -1.5, -0.9];
/** The point with frame coordinates (X, Y). */
const at = (X: number, Y: number): [number, number] => [cx + X * Math.cos(angle) - Y * Math.sin(angle), cy + X * Math.sin(angle) + Y * Math.cos(angle)];

describe('the oval cubic form (s + bX)Y² − (X − r₁)(X − r₂)(X − r₃) in a turned frame', () => {
  const f = ovalCubicForm(roots, 1.7, 0.2, angle, cx, cy);

  it.each(roots)('vanishes where the frame axis Y = 0 crosses at X = %f', (r) => {
    expect(evaluate(f, at(r, 0))).toBeCloseTo(0, 12);
  });

  it('matches the frame formula at a point off the axis', () => {
    const [X, Y] = [0.7, -1.3];
    expect(evaluate(f, at(X, Y))).toBeCloseTo((1.7 + 0.2 * X) * Y * Y - roots.reduce((p, r) => p * (X - r), 1), 12);
  });

  it('is negative inside the oval and positive between the oval and the open arm (s > 0)', () => {
    // Between r₁ and r₂ the cubic factor is positive, so f < 0 on the axis; between r₂ and r₃ it is negative.
    expect(evaluate(f, at(-1.5, 0))).toBeLessThan(0);
    expect(evaluate(f, at(-1, 0))).toBeGreaterThan(0);
  });
});
