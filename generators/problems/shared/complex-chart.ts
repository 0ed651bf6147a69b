/**
 * A fixed complex 2×2 matrix A = [[a11, a12], [a21, a22]] (each entry [re, im]) used as a chart of plane lines:
 * the line Y = mX + k of the (X, Y) plane is mapped to the (x, y) plane by (x, y) = A·(X, Y). When the column
 * (a12, a22) is not a real direction, every real line of the (x, y) plane is the image of one with finite (m, k).
 */
export type ComplexMatrix2 = readonly [readonly [number, number], readonly [number, number], readonly [number, number], readonly [number, number]];

type C = [number, number];
const mul = (a: readonly number[], b: readonly number[]): C => [a[0]! * b[0]! - a[1]! * b[1]!, a[0]! * b[1]! + a[1]! * b[0]!];
const div = (a: readonly number[], b: readonly number[]): C => {
  const n = b[0]! ** 2 + b[1]! ** 2;
  return [(a[0]! * b[0]! + a[1]! * b[1]!) / n, (a[1]! * b[0]! - a[0]! * b[1]!) / n];
};

/**
 * The coefficients (u, v, w) of the image line ux + vy + w = 0 of mX − Y + k = 0 under (x, y) = A·(X, Y), packed
 * complex (length 6), up to a common factor: (u, v) = (m, −1)·A⁻¹ and w = k.
 */
export function imageLine(A: ComplexMatrix2, m: readonly number[], k: readonly number[]): Float64Array {
  const [a11, a12, a21, a22] = A;
  const det: C = [mul(a11, a22)[0] - mul(a12, a21)[0], mul(a11, a22)[1] - mul(a12, a21)[1]];
  const ma22 = mul(m, a22), ma12 = mul(m, a12);
  const u = div([ma22[0] + a21[0], ma22[1] + a21[1]], det);
  const v = div([-ma12[0] - a11[0], -ma12[1] - a11[1]], det);
  return new Float64Array([u[0], u[1], v[0], v[1], k[0]!, k[1]!]);
}
