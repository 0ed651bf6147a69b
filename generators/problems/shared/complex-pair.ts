/** A complex number as [re, im] (for small scalar computations outside the engine's packed kernels). */
export type ComplexPair = [number, number];

/** a + b + … (exact up to binary64 rounding). */
export const addPairs = (...zs: readonly ComplexPair[]): ComplexPair => zs.reduce<ComplexPair>((s, z) => [s[0] + z[0], s[1] + z[1]], [0, 0]);
/** a − b. */
export const subPairs = (a: ComplexPair, b: ComplexPair): ComplexPair => [a[0] - b[0], a[1] - b[1]];
/** a · b. */
export const mulPairs = (a: ComplexPair, b: ComplexPair): ComplexPair => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
/** a / b by the textbook formula (b ≠ 0; no scaling against overflow). */
export const divPairs = (a: ComplexPair, b: ComplexPair): ComplexPair => {
  const d = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
};
/** The pair at complex index k of a packed (re, im interleaved) array. */
export const pairAt = (v: Float64Array, k: number): ComplexPair => [v[2 * k]!, v[2 * k + 1]!];
