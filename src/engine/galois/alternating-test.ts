import { isPrimitive } from './blocks.ts';
import { isTransitive } from './orbits.ts';
import { isOdd, type Permutation } from './permutation.ts';
import { primeCycleWitness } from './prime-cycle.ts';

/** What the test found: the group's action, the witnesses used, and whether it holds the alternating group. */
export interface AlternatingEvidence {
  readonly transitive: boolean;
  /** Checked only when transitive (else false). */
  readonly primitive: boolean;
  /** Index (in the list given) of an element a power of which is a p-cycle, with p; null when none was seen. */
  readonly primeCycle: { readonly element: number; readonly prime: number } | null;
  /** Index of an odd element, or null. */
  readonly oddElement: number | null;
  /** True when the group provably contains the alternating group A_n (Jordan's theorem). */
  readonly containsAlternating: boolean;
}

/**
 * Decides from group elements whether the group they generate contains A_n, by Jordan's theorem (C. Jordan, "Sur
 * la limite de transitivité des groupes non alternés", Bull. Soc. Math. France 1, 1873): a primitive group of degree
 * n that contains a cycle of prime length p ≤ n − 3 contains A_n. The elements are the generators themselves (monodromy
 * loops); any of them with a power that is a p-cycle is a witness. An odd element then makes the group S_n. The method
 * is Hauenstein–Rodriguez–Sottile's for numerical Galois groups (arXiv:1605.07806). Exact; O(n² · elements).
 */
export function alternatingEvidence(elements: readonly Permutation[], n: number): AlternatingEvidence {
  const transitive = isTransitive(elements, n);
  const primitive = transitive && isPrimitive(elements, n);
  let primeCycle: AlternatingEvidence['primeCycle'] = null;
  elements.forEach((g, element) => {
    const prime = primeCycleWitness(g);
    if (prime !== null && (primeCycle === null || prime > primeCycle.prime)) primeCycle = { element, prime };
  });
  const odd = elements.findIndex((g) => isOdd(g));
  return { transitive, primitive, primeCycle, oddElement: odd >= 0 ? odd : null, containsAlternating: primitive && primeCycle !== null };
}
