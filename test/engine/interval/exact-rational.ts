/**
 * Exact rational arithmetic with BigInt fractions, the reference the interval tests check against.
 * A double converts exactly (sign · mantissa · 2^exponent, subnormals included); ±∞ stay as markers.
 */
export interface Fraction { readonly n: bigint; readonly d: bigint }
export type Exact = Fraction | 'inf' | '-inf';

const view = new DataView(new ArrayBuffer(8));

/** The exact rational value of a finite double; 'inf' / '-inf' for infinities; throws on NaN. */
export function exactOf(x: number): Exact {
  if (x !== x) throw new RangeError('NaN has no exact value');
  if (x === Infinity) return 'inf';
  if (x === -Infinity) return '-inf';
  view.setFloat64(0, x);
  const bits = view.getBigUint64(0);
  const negative = bits >> 63n === 1n;
  const biased = Number((bits >> 52n) & 0x7ffn);
  const fraction = bits & ((1n << 52n) - 1n);
  const mantissa = biased === 0 ? fraction : fraction | (1n << 52n);
  const exponent = (biased === 0 ? 1 : biased) - 1075;
  let n = negative ? -mantissa : mantissa;
  let d = 1n;
  if (exponent >= 0) n <<= BigInt(exponent);
  else d <<= BigInt(-exponent);
  return reduce(n, d);
}

function gcd(a: bigint, b: bigint): bigint {
  a = a < 0n ? -a : a;
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

function reduce(n: bigint, d: bigint): Fraction {
  if (d < 0n) { n = -n; d = -d; }
  const g = gcd(n, d);
  return g > 1n ? { n: n / g, d: d / g } : { n, d };
}

export function fAdd(a: Fraction, b: Fraction): Fraction { return reduce(a.n * b.d + b.n * a.d, a.d * b.d); }
export function fSub(a: Fraction, b: Fraction): Fraction { return reduce(a.n * b.d - b.n * a.d, a.d * b.d); }
export function fMul(a: Fraction, b: Fraction): Fraction { return reduce(a.n * b.n, a.d * b.d); }
export function fDiv(a: Fraction, b: Fraction): Fraction {
  if (b.n === 0n) throw new RangeError('division by zero');
  return reduce(a.n * b.d, a.d * b.n);
}
/** −1, 0, 1 as a <, =, > b. */
export function fCmp(a: Fraction, b: Fraction): number {
  const l = a.n * b.d, r = b.n * a.d;
  return l < r ? -1 : l > r ? 1 : 0;
}

/** True when the exact value v lies in [lo, hi] (double endpoints, infinities allowed, NaN never). */
export function inside(v: Fraction, lo: number, hi: number): boolean {
  if (lo !== lo || hi !== hi) return false;
  const l = exactOf(lo), h = exactOf(hi);
  const aboveLo = l === '-inf' || (l !== 'inf' && fCmp(v, l) >= 0);
  const belowHi = h === 'inf' || (h !== '-inf' && fCmp(v, h) <= 0);
  return aboveLo && belowHi;
}

/** The finite exact value of a double (throws on infinities, for tests that only use finite operands). */
export function finite(x: number): Fraction {
  const e = exactOf(x);
  if (typeof e === 'string') throw new RangeError(`${x} is not finite`);
  return e;
}
