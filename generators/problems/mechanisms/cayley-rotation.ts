import type { Vector3 } from './vector3.ts';

/**
 * The rotation of the Cayley (Gibbs) vector s: R = ((1 − s·s)I + 2ssᵀ + 2[s]×)/(1 + s·s), a turn by 2·atan|s| about s
 * (real s; every rotation but the half-turns has one). Returns the rows of R.
 */
export function cayleyRotation([s1, s2, s3]: readonly number[]): [Vector3, Vector3, Vector3] {
  const s = [s1!, s2!, s3!];
  const ss = s[0]! ** 2 + s[1]! ** 2 + s[2]! ** 2;
  const cross = [[0, -s[2]!, s[1]!], [s[2]!, 0, -s[0]!], [-s[1]!, s[0]!, 0]];
  return [0, 1, 2].map((r) => [0, 1, 2].map((c) => ((r === c ? 1 - ss : 0) + 2 * s[r]! * s[c]! + 2 * cross[r]![c]!) / (1 + ss))) as [Vector3, Vector3, Vector3];
}

/** Rᵀv for a rotation given by its rows. */
export function transposeTimes(rows: readonly Vector3[], v: Vector3): Vector3 {
  return [0, 1, 2].map((c) => rows[0]![c]! * v[0] + rows[1]![c]! * v[1] + rows[2]![c]! * v[2]) as Vector3;
}
