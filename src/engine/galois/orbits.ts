import type { Permutation } from './permutation.ts';

/** Orbit labels of the group the generators generate on {0, …, n−1}: label[i] is the least point of i's orbit. */
export function orbitLabels(generators: readonly Permutation[], n: number): Int32Array {
  const label = new Int32Array(n).fill(-1);
  const queue = new Int32Array(n);
  for (let start = 0; start < n; start++) {
    if (label[start] !== -1) continue;
    let head = 0, tail = 0;
    queue[tail++] = start;
    label[start] = start;
    while (head < tail) {
      const x = queue[head++]!;
      for (const g of generators) {
        const y = g[x]!;
        if (label[y] === -1) { label[y] = start; queue[tail++] = y; }
      }
    }
  }
  return label;
}

/** Whether the generated group is transitive (one orbit; degree 0 and 1 count as transitive). */
export function isTransitive(generators: readonly Permutation[], n: number): boolean {
  const label = orbitLabels(generators, n);
  for (let i = 0; i < n; i++) if (label[i] !== 0) return false;
  return true;
}
