import type { Polynomial } from './expand-system.ts';

/**
 * A finite number as plain decimal digits without exponent (the shortest round-trip digits of binary64, shifted):
 * 1e-7 → "0.0000001", 2.5e21 → "2500000000000000000000", −0 → "0". Reading the text back gives the same double.
 */
export function plainDecimal(x: number): string {
  if (!Number.isFinite(x)) throw new RangeError(`plainDecimal: ${x} is not finite`);
  if (x === 0) return '0';
  const text = String(Math.abs(x));
  const sign = x < 0 ? '-' : '';
  const m = /^(\d+)(?:\.(\d+))?e([+-]\d+)$/.exec(text);
  if (!m) return sign + text;
  const digits = m[1]! + (m[2] ?? ''), point = m[1]!.length + Number(m[3]);
  const body = point <= 0 ? `0.${'0'.repeat(-point)}${digits}` : point >= digits.length ? digits + '0'.repeat(point - digits.length) : `${digits.slice(0, point)}.${digits.slice(point)}`;
  return sign + body;
}

/** Total degree first (highest first), then lexicographic on the exponent vector (highest first): "grlex" descending. */
function order(a: readonly number[], b: readonly number[]): number {
  const da = a.reduce((s, e) => s + e, 0), db = b.reduce((s, e) => s + e, 0);
  if (da !== db) return db - da;
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return b[i]! - a[i]!;
  return 0;
}

/**
 * A polynomial in the atlas's plain notation, which common computer-algebra systems read: terms in descending
 * graded-lexicographic order joined by " + " / " - ", products with "*", powers with "^", the imaginary unit "I",
 * complex coefficients in parentheses "(re + im*I)", coefficients ±1 left out before a monomial, decimals without
 * exponents (plainDecimal). The zero polynomial is "0".
 */
export function polynomialText(poly: Polynomial, names: readonly string[]): string {
  const terms = [...poly].map(([k, c]) => [k.split(',').map(Number), c] as const).sort(([a], [b]) => order(a, b));
  if (terms.length === 0) return '0';
  return terms.map(([e, [re, im]], i) => {
    const monomial = e.flatMap((p, j) => (p === 0 ? [] : [p === 1 ? names[j]! : `${names[j]}^${p}`])).join('*');
    let sign = '+', coefficient: string;
    if (im === 0) {
      sign = re < 0 ? '-' : '+';
      coefficient = Math.abs(re) === 1 && monomial ? '' : plainDecimal(Math.abs(re));
    } else if (re === 0) {
      sign = im < 0 ? '-' : '+';
      coefficient = `${Math.abs(im) === 1 ? '' : `${plainDecimal(Math.abs(im))}*`}I`;
    } else {
      coefficient = `(${plainDecimal(re)} ${im < 0 ? '-' : '+'} ${plainDecimal(Math.abs(im))}*I)`;
    }
    const body = coefficient && monomial ? `${coefficient}*${monomial}` : coefficient || monomial;
    return i === 0 ? (sign === '-' ? `-${body}` : body) : ` ${sign} ${body}`;
  }).join('');
}
