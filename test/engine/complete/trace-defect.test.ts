import { describe, expect, it } from 'vitest';
import { traceDefect } from '../../../src/engine/complete/trace-defect.ts';

// T(λ) given as a function of complex λ = [re, im]; the defect of three samples.
type Complex = readonly [number, number];
const mul = ([a, b]: Complex, [c, d]: Complex): Complex => [a * c - b * d, a * d + b * c];
const defectOf = (t: (l: Complex) => Complex, lambdas: readonly Complex[], scale = 1): number =>
  traceDefect(Float64Array.from(lambdas.flat()), Float64Array.from(lambdas.map(t).flat()), scale);

const triangles: readonly (readonly Complex[])[] = [
  [[0.3, -1.1], [1.7, 0.4], [-0.8, 0.9]],
  [[2, 0], [2.01, 0.02], [-1, 3]], // one short side: the relabelling puts the long side first
  [[0, 0], [1, 0], [0.5, 1e-3]], // nearly collinear vertices are fine: T is a function of complex λ
];

describe('traceDefect: distance of three traces from an affine-linear function of λ (common practice, no source)', () => {
  it.each(triangles)('is at round-off for T(λ) = α + βλ (triangle %#)', (...lambdas) => {
    const alpha: Complex = [3.2, -7.5], beta: Complex = [-1.25, 0.75];
    const t = (l: Complex): Complex => { const b = mul(beta, l); return [alpha[0] + b[0], alpha[1] + b[1]]; };
    expect(defectOf(t, lambdas, 10)).toBeLessThan(1e-15);
  });
  it.each(triangles)('equals |(λ₃ − λ₁)(λ₃ − λ₂)| for T(λ) = λ² (triangle %#), whatever the labelling', (...lambdas) => {
    const t = (l: Complex): Complex => mul(l, l);
    const [l1, l2, l3] = lambdas as [Complex, Complex, Complex];
    // With λ₁λ₂ the longest side, λ² − (line through λ₁, λ₂) = (λ − λ₁)(λ − λ₂) at the third vertex.
    const sides = [[l1, l2, l3], [l2, l3, l1], [l1, l3, l2]] as const;
    const length = ([a, b]: readonly [Complex, Complex, Complex]) => Math.hypot(a[0] - b[0], a[1] - b[1]);
    const [a, b, c] = [...sides].sort((x, y) => length(y) - length(x))[0]!;
    const expected = Math.hypot(...mul([c[0] - a[0], c[1] - a[1]], [c[0] - b[0], c[1] - b[1]]));
    expect(defectOf(t, lambdas)).toBeCloseTo(expected, 12);
    expect(defectOf(t, [lambdas[2]!, lambdas[0]!, lambdas[1]!])).toBeCloseTo(expected, 12);
  });
  it('is relative to the scale it is given', () => {
    const t = (l: Complex): Complex => mul(l, l);
    const lambdas = triangles[0]!;
    expect(defectOf(t, lambdas, 1000)).toBeCloseTo(defectOf(t, lambdas, 1) / 1000, 15);
  });
  it('is infinite for coincident λs or a scale that is not positive', () => {
    const t = (l: Complex): Complex => l;
    expect(defectOf(t, [[1, 1], [1, 1], [1, 1]])).toBe(Infinity);
    expect(defectOf(t, triangles[0]!, 0)).toBe(Infinity);
  });
});
