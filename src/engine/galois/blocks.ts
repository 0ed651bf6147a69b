import type { Permutation } from './permutation.ts';

/**
 * The smallest block of imprimitivity that holds both a and b, for the group the generators generate (transitive
 * on {0, …, n−1}): Atkinson's algorithm (M. D. Atkinson, "An algorithm for finding the blocks of a permutation
 * group", Math. Comp. 29, 1975): merge a and b, and whenever two classes merge, merge their images under every
 * generator. Returns the block's points in increasing order.
 */
export function minimalBlock(generators: readonly Permutation[], n: number, a: number, b: number): number[] {
  const parent = new Int32Array(n);
  for (let i = 0; i < n; i++) parent[i] = i;
  const find = (x: number): number => {
    while (parent[x] !== x) { parent[x] = parent[parent[x]!]!; x = parent[x]!; }
    return x;
  };
  const pending: number[] = [a, b];
  parent[find(b)] = find(a);
  while (pending.length > 0) {
    const y = pending.pop()!, x = pending.pop()!;
    for (const g of generators) {
      const gx = find(g[x]!), gy = find(g[y]!);
      if (gx === gy) continue;
      parent[gy] = gx;
      pending.push(gx, gy);
    }
  }
  const root = find(a);
  const block: number[] = [];
  for (let i = 0; i < n; i++) if (find(i) === root) block.push(i);
  return block;
}

/**
 * Whether a transitive group is primitive: no block other than single points and the whole set. Checks the minimal
 * block of {0, b} for every b (every nontrivial block holds 0 and some b, by transitivity). O(n² · generators).
 */
export function isPrimitive(generators: readonly Permutation[], n: number): boolean {
  for (let b = 1; b < n; b++) if (minimalBlock(generators, n, 0, b).length < n) return false;
  return true;
}
