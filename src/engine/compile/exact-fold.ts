import { productError } from '../dd/error-free-product.ts';
import { sumError } from '../dd/error-free-sum.ts';

/** Largest magnitude at which Dekker's product error is trusted (see dd/error-free-product.ts): 2⁴⁹⁰, squares stay finite. */
const SAFE = 2 ** 490;
/** Smallest nonzero magnitude at which a product's error cannot fall among the subnormals: 2⁻⁴⁸⁰. */
const TINY = 2 ** -480;

const inRange = (v: number): boolean => v === 0 || (Math.abs(v) <= SAFE && Math.abs(v) >= TINY);

/** True when a + b is exactly representable (RN(a + b) = a + b); false outside the finite range. */
export function isExactSum(a: number, b: number): boolean {
  const s = a + b;
  return Number.isFinite(s) && sumError(a, b, s) === 0;
}

/** True when a·b is exactly representable; decided by Dekker's error term only where it is exact, else false. */
export function isExactProduct(a: number, b: number): boolean {
  if (a === 0 || b === 0) return true;
  if (!inRange(a) || !inRange(b)) return false;
  const p = a * b;
  return Number.isFinite(p) && productError(a, b, p) === 0;
}

/** True when the complex product (ar + i·ai)(br + i·bi), folded as the tape folds it, carries no rounding. */
export function isExactComplexProduct(ar: number, ai: number, br: number, bi: number): boolean {
  return isExactProduct(ar, br) && isExactProduct(ai, bi) && isExactProduct(ar, bi) && isExactProduct(ai, br)
    && isExactSum(ar * br, -(ai * bi)) && isExactSum(ar * bi, ai * br);
}
