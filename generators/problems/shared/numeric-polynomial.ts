/**
 * Small exact-structure, floating-point-coefficient polynomials used to build demo data (for example a surface
 * given as a sum of cubes of linear forms, expanded into monomial coefficients). Keys are exponent vectors
 * joined by commas; not for hot loops.
 */
export type NumericPolynomial = ReadonlyMap<string, number>;

/** The linear form c₀·v₀ + … + c_{n−1}·v_{n−1} + constant in n variables. */
export function linearForm(coefficients: readonly number[], constant = 0): NumericPolynomial {
  const n = coefficients.length;
  const out = new Map<string, number>();
  coefficients.forEach((c, i) => out.set(Array.from({ length: n }, (_, k) => (k === i ? 1 : 0)).join(','), c));
  out.set(new Array(n).fill(0).join(','), constant);
  return out;
}

/** p + q. */
export function sum(...ps: NumericPolynomial[]): NumericPolynomial {
  const out = new Map<string, number>();
  for (const p of ps) for (const [k, c] of p) out.set(k, (out.get(k) ?? 0) + c);
  return out;
}

/** c·p. */
export function scale(p: NumericPolynomial, c: number): NumericPolynomial {
  return new Map([...p].map(([k, v]) => [k, c * v]));
}

/** p·q. */
export function product(...ps: NumericPolynomial[]): NumericPolynomial {
  return ps.reduce((acc, q) => {
    const out = new Map<string, number>();
    for (const [ka, a] of acc) for (const [kb, b] of q) {
      const ea = ka.split(',').map(Number);
      const eb = kb.split(',').map(Number);
      const key = ea.map((e, i) => e + eb[i]!).join(',');
      out.set(key, (out.get(key) ?? 0) + a * b);
    }
    return out;
  });
}

/** The coefficients of p for the given exponent vectors (0 where absent), rounded to `digits` decimals. */
export function coefficientsOf(p: NumericPolynomial, exponents: readonly (readonly number[])[], digits = 9): number[] {
  const f = 10 ** digits;
  return exponents.map((e) => Math.round((p.get(e.join(',')) ?? 0) * f) / f);
}

/** p evaluated at the point. */
export function evaluate(p: NumericPolynomial, point: readonly number[]): number {
  let s = 0;
  for (const [k, c] of p) s += c * k.split(',').reduce((acc, e, i) => acc * point[i]! ** Number(e), 1);
  return s;
}
