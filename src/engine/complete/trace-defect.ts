/**
 * How far three traces are from an affine-linear function of λ: with λ₁, λ₂, λ₃ in `lambdas` and T₁, T₂, T₃ in
 * `traces` (packed complex, length 6 each), relabelled so that λ₁λ₂ is the longest side of the triangle,
 * |T₃ − T₁ − (λ₃ − λ₁)/(λ₂ − λ₁)·(T₂ − T₁)| / scale. The relabelling keeps |λ₃ − λ₁|/|λ₂ − λ₁| ≤ 1, so the formula's
 * own round-off is a few ulps of (|T₁| + |T₂| + |T₃|) / scale, far below the defects measured for complete fibres
 * (see trace-test.ts). Returns Infinity for coincident λs or a scale that is not positive.
 */
export function traceDefect(lambdas: Float64Array, traces: Float64Array, scale: number): number {
  const side = (i: number, j: number): number => Math.hypot(lambdas[2 * i]! - lambdas[2 * j]!, lambdas[2 * i + 1]! - lambdas[2 * j + 1]!);
  const sides = [side(0, 1), side(1, 2), side(0, 2)];
  const longest = sides.indexOf(Math.max(...sides));
  const [a, b, c] = longest === 0 ? [0, 1, 2] : longest === 1 ? [1, 2, 0] : [0, 2, 1];
  const l21r = lambdas[2 * b]! - lambdas[2 * a]!, l21i = lambdas[2 * b + 1]! - lambdas[2 * a + 1]!;
  const l31r = lambdas[2 * c]! - lambdas[2 * a]!, l31i = lambdas[2 * c + 1]! - lambdas[2 * a + 1]!;
  const d = l21r * l21r + l21i * l21i;
  if (!(d > 0) || !(scale > 0)) return Infinity;
  const qr = (l31r * l21r + l31i * l21i) / d, qi = (l31i * l21r - l31r * l21i) / d;
  const t21r = traces[2 * b]! - traces[2 * a]!, t21i = traces[2 * b + 1]! - traces[2 * a + 1]!;
  const t31r = traces[2 * c]! - traces[2 * a]!, t31i = traces[2 * c + 1]! - traces[2 * a + 1]!;
  return Math.hypot(t31r - (qr * t21r - qi * t21i), t31i - (qr * t21i + qi * t21r)) / scale;
}
