/** Significant digits kept for solution coordinates and parameters in a record (a double carries 15–17). */
export const COORDINATE_DIGITS = 15;

/** Significant digits kept for diagnostics (residuals, condition estimates, step statistics, seconds). */
export const DIAGNOSTIC_DIGITS = 3;

/**
 * x rounded to `digits` significant decimal digits (round-half-even of the decimal expansion, as toPrecision
 * does), returned as the nearest double; −0 becomes 0. Non-finite input is returned unchanged for the caller to
 * reject. Rounding is idempotent: rounding a rounded value gives the same value.
 */
export function roundSignificant(x: number, digits: number): number {
  if (!Number.isFinite(x) || x === 0) return x === 0 ? 0 : x;
  return Number(x.toPrecision(digits));
}
