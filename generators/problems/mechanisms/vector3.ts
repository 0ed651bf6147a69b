/** A point or vector of space, [x, y, z]. */
export type Vector3 = [number, number, number];

/** The dot product of two real vectors of space. */
export function dot3(a: Vector3, b: Vector3): number {
  return a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
}
