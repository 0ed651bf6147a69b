import { monomialExponents } from './monomials.ts';

/** Exponent vectors of the monomials of exact degree `degree` in `variables` unknowns, in monomialExponents order (x₀ᵈ first). */
export function homogeneousExponents(variables: number, degree: number): number[][] {
  return monomialExponents(variables, degree).filter((e) => e.reduce((s, k) => s + k, 0) === degree);
}

/** Parameter names of a form's coefficients: prefix then the exponent digits (c41000 for x₀⁴x₁), homogeneousExponents order. */
export function homogeneousNames(prefix: string, variables: number, degree: number): string[] {
  return homogeneousExponents(variables, degree).map((e) => `${prefix}${e.join('')}`);
}
