/**
 * Exponent vectors of all monomials in `variables` unknowns of total degree at most `degree`, highest degree
 * first, then lexicographically descending (x² before xy before y² before x …). Deterministic order.
 */
export function monomialExponents(variables: number, degree: number): number[][] {
  const out: number[][] = [];
  for (let d = degree; d >= 0; d--) out.push(...ofDegree(variables, d));
  return out;
}

function ofDegree(variables: number, d: number): number[][] {
  if (variables === 1) return [[d]];
  const out: number[][] = [];
  for (let first = d; first >= 0; first--) for (const rest of ofDegree(variables - 1, d - first)) out.push([first, ...rest]);
  return out;
}

/** Parameter names for the coefficients of a polynomial: prefix followed by the exponent digits (c21 for x²y). */
export function coefficientNames(prefix: string, variables: number, degree: number): string[] {
  return monomialExponents(variables, degree).map((e) => `${prefix}${e.join('')}`);
}
