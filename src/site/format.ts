/** Unicode minus for display; CSV and JSON keep ASCII. */
const MINUS = '\u2212';

/** A finite number at `digits` significant digits, trailing zeros trimmed, exponent form outside [1e-4, 1e6); "−0" → "0". */
export function formatNumber(value: number, digits = 6): string {
  if (Number.isNaN(value)) return 'NaN';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : `${MINUS}∞`;
  if (value === 0) return '0';
  const abs = Math.abs(value);
  let text: string;
  if (abs >= 1e-4 && abs < 1e6) {
    text = value.toPrecision(digits);
    if (text.includes('e')) text = String(Number(text));
    if (text.includes('.')) text = text.replace(/0+$/, '').replace(/\.$/, '');
  } else {
    const [mantissa, exponent] = value.toExponential(digits - 1).split('e') as [string, string];
    const m = mantissa.includes('.') ? mantissa.replace(/0+$/, '').replace(/\.$/, '') : mantissa;
    text = `${m}e${exponent.replace('+', '')}`;
  }
  if (/^-0(\.0*)?$/.test(text)) return '0';
  return text.replace(/-/g, MINUS);
}

/**
 * A complex [re, im] in display parts: ["a"], ["bi"], or ["a", "+ bi"] / ["a", "− bi"] (imaginary part below
 * `zero` × (1 + |re|) dropped, real part below `zero` × (1 + |im|) dropped, "1i" written "i"). Tables may wrap between parts.
 */
export function complexParts(value: readonly [number, number], digits = 6, zero = 1e-12): string[] {
  const [re, im] = value;
  if (Math.abs(im) <= zero * (1 + Math.abs(re))) return [formatNumber(re, digits)];
  const imText = formatNumber(Math.abs(im), digits);
  const imPart = imText === '1' ? 'i' : `${imText}i`;
  if (Math.abs(re) <= zero * (1 + Math.abs(im))) return [im < 0 ? `${MINUS}${imPart}` : imPart];
  return [formatNumber(re, digits), `${im < 0 ? MINUS : '+'} ${imPart}`];
}

/** A complex [re, im] as "a + bi" / "a − bi" / "a" / "bi" (see complexParts). */
export function formatComplex(value: readonly [number, number], digits = 6, zero = 1e-12): string {
  return complexParts(value, digits, zero).join(' ');
}

/** A residual or other small positive quantity in two-digit exponent form ("5.1e−16"). */
export function formatResidual(value: number): string {
  if (value === 0) return '0';
  return formatNumber(value, 2).includes('e') ? formatNumber(value, 2) : value.toExponential(1).replace('+', '').replace('-', MINUS);
}

/** A condition estimate; null (singular Jacobian) shows as "∞ (singular)". */
export function formatCondition(value: number | null): string {
  return value === null ? '∞ (singular)' : formatNumber(value, 3);
}

/** "yes"/"no" for table cells. */
export function yesNo(flag: boolean): string {
  return flag ? 'yes' : 'no';
}

/** A count that may be unknown (null → "unknown"). */
export function formatCount(value: number | null): string {
  return value === null ? 'unknown' : value.toLocaleString('en-US');
}
