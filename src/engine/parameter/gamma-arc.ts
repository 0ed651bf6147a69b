/**
 * The gamma trick for a parameter segment: p(t) = p₀ + τ(t)(p₁ − p₀) with τ(t) = t / (γ(1 − t) + t), so that
 * τ runs from 0 to 1 along a circular arc in ℂ (a straight segment when γ = 1). For a random unit γ the arc
 * misses the finitely many bad points of the complex line through p₀ and p₁ with probability one.
 */
export interface ParameterLeg {
  /** Packed complex parameters at t = 0. */
  readonly from: Float64Array;
  /** Packed complex parameters at t = 1. */
  readonly to: Float64Array;
  /** The gamma constant [re, im] (any nonzero complex; a random unit number in practice). */
  readonly gamma: readonly [number, number];
}

/**
 * Writes τ(t) to out[0..1] and dτ/dt = γ / (γ(1 − t) + t)² to out[2..3], for complex t and γ.
 * Exact formula in floating point (relative error a few ulps); allocates nothing. The denominator vanishes only
 * when t = γ/(γ − 1), which is off [0, 1] for non-real γ.
 */
export function gammaArc(tRe: number, tIm: number, gRe: number, gIm: number, out: Float64Array): void {
  // d = γ(1 − t) + t
  const oneMinusRe = 1 - tRe, oneMinusIm = -tIm;
  const dRe = gRe * oneMinusRe - gIm * oneMinusIm + tRe;
  const dIm = gRe * oneMinusIm + gIm * oneMinusRe + tIm;
  const dd = dRe * dRe + dIm * dIm;
  const invRe = dRe / dd, invIm = -dIm / dd;
  out[0] = tRe * invRe - tIm * invIm;
  out[1] = tRe * invIm + tIm * invRe;
  const inv2Re = invRe * invRe - invIm * invIm, inv2Im = 2 * invRe * invIm;
  out[2] = gRe * inv2Re - gIm * inv2Im;
  out[3] = gRe * inv2Im + gIm * inv2Re;
}
