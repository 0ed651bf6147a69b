/**
 * Neighbouring doubles, read off the IEEE 754 bit pattern through a shared Float64Array / Uint32Array view.
 * Exact: no arithmetic on the value itself, so the answer does not depend on the rounding mode.
 * Edge cases: nextUp(±0) = 2⁻¹⁰⁷⁴ (the least subnormal), nextUp(+∞) = +∞, nextUp(−∞) = −MAX_VALUE,
 * nextUp(MAX_VALUE) = +∞, NaN stays NaN; nextDown(x) = −nextUp(−x).
 */
const f64 = new Float64Array(1);
const u32 = new Uint32Array(f64.buffer);
const littleEndian = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;
const LO = littleEndian ? 0 : 1;
const HI = littleEndian ? 1 : 0;

/** The least double strictly greater than x (x itself for NaN and +∞). */
export function nextUp(x: number): number {
  if (x !== x || x === Infinity) return x;
  if (x === 0) return Number.MIN_VALUE;
  f64[0] = x;
  const lo = u32[LO]!;
  if (x > 0) {
    // magnitude grows: add one to the 64-bit pattern
    if (lo === 0xffffffff) { u32[LO] = 0; u32[HI] = u32[HI]! + 1; } else u32[LO] = lo + 1;
  } else {
    // negative: magnitude shrinks, subtract one from the pattern
    if (lo === 0) { u32[LO] = 0xffffffff; u32[HI] = u32[HI]! - 1; } else u32[LO] = lo - 1;
  }
  return f64[0]!;
}

/** The greatest double strictly less than x (x itself for NaN and −∞). */
export function nextDown(x: number): number {
  return -nextUp(-x);
}
