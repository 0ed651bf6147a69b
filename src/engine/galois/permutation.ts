/**
 * A permutation of {0, …, n−1} as its image array: p[i] is where i goes. Products read left to right
 * ("first a, andThen b"), as monodromy loops compose: andThen(a, b)[i] = b[a[i]].
 */
export type Permutation = Int32Array;

/** The identity permutation of degree n. */
export function identity(n: number): Permutation {
  const p = new Int32Array(n);
  for (let i = 0; i < n; i++) p[i] = i;
  return p;
}

/** The product "first a, then b" (same degree; not checked). Not named `then`: a module exporting `then` is a thenable. */
export function andThen(a: Permutation, b: Permutation): Permutation {
  const c = new Int32Array(a.length);
  for (let i = 0; i < a.length; i++) c[i] = b[a[i]!]!;
  return c;
}

/** The inverse permutation. */
export function inverse(p: Permutation): Permutation {
  const q = new Int32Array(p.length);
  for (let i = 0; i < p.length; i++) q[p[i]!] = i;
  return q;
}

/** Whether p fixes every point. */
export function isIdentity(p: Permutation): boolean {
  for (let i = 0; i < p.length; i++) if (p[i] !== i) return false;
  return true;
}

/** The first point p moves, or −1 for the identity. */
export function firstMoved(p: Permutation): number {
  for (let i = 0; i < p.length; i++) if (p[i] !== i) return i;
  return -1;
}

/** Whether an integer array is a permutation of {0, …, length−1} (every image in range, none repeated). */
export function isPermutation(p: ArrayLike<number>): boolean {
  const seen = new Uint8Array(p.length);
  for (let i = 0; i < p.length; i++) {
    const j = p[i]!;
    if (!Number.isInteger(j) || j < 0 || j >= p.length || seen[j]) return false;
    seen[j] = 1;
  }
  return true;
}

/** The cycle lengths of p, fixed points included, largest first (they add up to the degree). */
export function cycleType(p: Permutation): number[] {
  const seen = new Uint8Array(p.length);
  const lengths: number[] = [];
  for (let i = 0; i < p.length; i++) {
    if (seen[i]) continue;
    let len = 0;
    for (let j = i; !seen[j]; j = p[j]!) { seen[j] = 1; len++; }
    lengths.push(len);
  }
  return lengths.sort((a, b) => b - a);
}

/** Whether p is an odd permutation (its cycle type has an odd number of even-length cycles). */
export function isOdd(p: Permutation): boolean {
  return cycleType(p).filter((len) => len % 2 === 0).length % 2 === 1;
}

/** A cycle type written as exponents of lengths, fixed points left out: [3, 3, 2, 1] → "3²·2" (identity → "1"). */
export function cycleTypeText(lengths: readonly number[]): string {
  const counts = new Map<number, number>();
  for (const len of lengths) if (len > 1) counts.set(len, (counts.get(len) ?? 0) + 1);
  if (counts.size === 0) return '1';
  const sup = (k: number): string => (k === 1 ? '' : [...String(k)].map((d) => '⁰¹²³⁴⁵⁶⁷⁸⁹'[Number(d)]).join(''));
  return [...counts.entries()].sort((a, b) => b[0] - a[0]).map(([len, k]) => `${len}${sup(k)}`).join('·');
}
