import { ddAdd } from './dd-add.ts';
import { ddProductSum } from './dd-product-sum.ts';

/**
 * Complex double-double kernels: a complex number is four doubles (re.hi, re.lo, im.hi, im.lo), each part a
 * normalised double-double (dd-add.ts); results go to out[i..i+3] in the same order, nothing is allocated.
 * u = 2⁻⁵³; no overflow or underflow is assumed.
 */

/** out[i..i+3] = a + b, each part with relative error ≤ 3u² + 13u³ (the accurate add, Joldes–Muller–Popescu 2017). */
export function complexDdAdd(arh: number, arl: number, aih: number, ail: number, brh: number, brl: number, bih: number, bil: number, out: Float64Array, i: number): void {
  ddAdd(arh, arl, brh, brl, out, i);
  ddAdd(aih, ail, bih, bil, out, i + 2);
}

/** out[i..i+3] = a − b, each part with relative error ≤ 3u² + 13u³. */
export function complexDdSub(arh: number, arl: number, aih: number, ail: number, brh: number, brl: number, bih: number, bil: number, out: Float64Array, i: number): void {
  ddAdd(arh, arl, -brh, -brl, out, i);
  ddAdd(aih, ail, -bih, -bil, out, i + 2);
}

/** out[i..i+3] = a·b with |error re| ≤ 14u²(|ar·br| + |ai·bi|) and |error im| ≤ 14u²(|ar·bi| + |ai·br|) (ddProductSum). */
export function complexDdMul(arh: number, arl: number, aih: number, ail: number, brh: number, brl: number, bih: number, bil: number, out: Float64Array, i: number): void {
  ddProductSum(arh, arl, brh, brl, -aih, -ail, bih, bil, out, i);
  ddProductSum(arh, arl, bih, bil, aih, ail, brh, brl, out, i + 2);
}
