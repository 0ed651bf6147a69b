import { COORDINATE_DIGITS, DIAGNOSTIC_DIGITS, roundSignificant } from '../../src/atlas/digits.ts';

const DIAGNOSTIC_KEYS = new Set(['residual', 'condition', 'stepsMedian', 'seconds']);

/**
 * A deep copy of record data with every number rounded to fixed significant digits: DIAGNOSTIC_DIGITS (3) under
 * the keys residual, condition, stepsMedian and seconds; COORDINATE_DIGITS (15) everywhere else (integers below
 * 10¹⁵ are unchanged). Rounding is idempotent, so a re-read record rounds to itself.
 */
export function roundNumbers<T>(value: T, digits = COORDINATE_DIGITS): T {
  if (typeof value === 'number') return roundSignificant(value, digits) as T;
  if (Array.isArray(value)) return value.map((v) => roundNumbers(v, digits)) as T;
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [k, v] of Object.entries(value)) out[k] = roundNumbers(v, DIAGNOSTIC_KEYS.has(k) ? DIAGNOSTIC_DIGITS : digits);
    return out as T;
  }
  return value;
}
