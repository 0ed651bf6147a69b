import { cycleType, type Permutation } from './permutation.ts';

/** Whether k is prime (trial division; k is a cycle length, so small). */
export function isPrime(k: number): boolean {
  if (k < 2 || !Number.isInteger(k)) return false;
  for (let d = 2; d * d <= k; d++) if (k % d === 0) return false;
  return true;
}

/**
 * A prime p ≤ n − 3 such that a power of g is a single p-cycle, or null: g has exactly one cycle of length p and no
 * other cycle length divisible by p, so g^m with m the lcm of the other lengths is a p-cycle (m is prime to p).
 * This is the witness Jordan's theorem asks for (see alternating-test.ts). Takes the largest such p.
 */
export function primeCycleWitness(g: Permutation): number | null {
  const n = g.length;
  const lengths = cycleType(g);
  let best: number | null = null;
  for (const p of new Set(lengths)) {
    if (!isPrime(p) || p > n - 3) continue;
    if (lengths.filter((len) => len === p).length !== 1) continue;
    if (lengths.some((len) => len !== p && len % p === 0)) continue;
    if (best === null || p > best) best = p;
  }
  return best;
}
