// Permutation groups built from their textbook definitions, for the group-algorithm tests (orders: e.g. Dixon–Mortimer,
// Permutation Groups, Springer 1996, ch. 2 and 3).
import type { Permutation } from '../../../src/engine/galois/permutation.ts';

/** The permutation x ↦ f(x) of {0, …, n−1}. */
export const mapping = (n: number, f: (x: number) => number): Permutation => Int32Array.from({ length: n }, (_, x) => f(x));

/** The cycle (c₀ c₁ … c_k) of degree n. */
export function cycle(n: number, ...points: number[]): Permutation {
  const p = mapping(n, (x) => x);
  points.forEach((c, i) => { p[c] = points[(i + 1) % points.length]!; });
  return p;
}

const mod = (a: number, p: number): number => ((a % p) + p) % p;
const inv = (a: number, p: number): number => { for (let b = 1; b < p; b++) if (mod(a * b, p) === 1) return b; throw new RangeError('no inverse'); };

/** Symmetric group S_n: a transposition and an n-cycle. */
export const symmetric = (n: number): Permutation[] => [cycle(n, 0, 1), cycle(n, ...Array.from({ length: n }, (_, i) => i))];

/** Alternating group A_n (n ≥ 3): a 3-cycle and an even long cycle. */
export const alternating = (n: number): Permutation[] =>
  n % 2 === 1 ? [cycle(n, 0, 1, 2), cycle(n, ...Array.from({ length: n }, (_, i) => i))] : [cycle(n, 0, 1, 2), cycle(n, ...Array.from({ length: n - 1 }, (_, i) => i + 1))];

/** Dihedral group of the n-gon, order 2n. */
export const dihedral = (n: number): Permutation[] => [mapping(n, (x) => (x + 1) % n), mapping(n, (x) => mod(-x, n))];

/** The projective line over F_p: points 0…p−1 and ∞ = p. */
const projective = (p: number, f: (x: number) => number): Permutation => mapping(p + 1, f);
/** x ↦ −1/x on the projective line. */
const negInverse = (p: number): Permutation => projective(p, (x) => (x === p ? 0 : x === 0 ? p : mod(-inv(x, p), p)));

/** PGL(2, p) on p + 1 points (x ↦ x + 1, x ↦ g x with g a primitive root, x ↦ −1/x): order p(p² − 1). */
export const pgl2 = (p: number, g: number): Permutation[] => [projective(p, (x) => (x === p ? p : (x + 1) % p)), projective(p, (x) => (x === p ? p : (g * x) % p)), negInverse(p)];

/** PSL(2, p) on p + 1 points (as PGL but scaling by g²): order p(p² − 1)/2 for odd p. */
export const psl2 = (p: number, g: number): Permutation[] => [projective(p, (x) => (x === p ? p : (x + 1) % p)), projective(p, (x) => (x === p ? p : (g * g * x) % p)), negInverse(p)];

/** AGL(1, p) on p points (x ↦ x + 1, x ↦ g x): order p(p − 1). */
export const agl1 = (p: number, g: number): Permutation[] => [mapping(p, (x) => (x + 1) % p), mapping(p, (x) => (g * x) % p)];

/** S₂ ≀ S₃ on 6 points, blocks {0,1} {2,3} {4,5}: imprimitive, order 48. */
export const wreathS2S3: Permutation[] = [cycle(6, 0, 1), cycle(6, 0, 2, 4, 1, 3, 5), mapping(6, (x) => [2, 3, 0, 1, 4, 5][x]!)];
