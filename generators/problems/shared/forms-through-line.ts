import { createDenseLU } from '../../../src/engine/index.ts';

/**
 * The form nearest to `coefficients` (Euclidean norm, packed complex, M entries) among those whose restriction
 * `matrix` (packed complex rows×M, see restrictionMatrix) vanishes: c − Aᴴ(AAᴴ)⁻¹Ac, solved by dense LU in binary64.
 * Throws when AAᴴ is numerically singular (the restriction map is then not onto).
 */
export function nearestFormThroughLine(coefficients: Float64Array, matrix: Float64Array, rows: number): Float64Array {
  const columns = coefficients.length / 2;
  const a = (k: number, m: number): [number, number] => [matrix[2 * (k * columns + m)]!, matrix[2 * (k * columns + m) + 1]!];
  const gram = new Float64Array(2 * rows * rows);
  const image = new Float64Array(2 * rows);
  for (let k = 0; k < rows; k++) {
    for (let l = 0; l < rows; l++) {
      let re = 0, im = 0;
      for (let m = 0; m < columns; m++) {
        const [xr, xi] = a(k, m), [yr, yi] = a(l, m);
        re += xr * yr + xi * yi;
        im += xi * yr - xr * yi;
      }
      gram[2 * (k * rows + l)] = re;
      gram[2 * (k * rows + l) + 1] = im;
    }
    let re = 0, im = 0;
    for (let m = 0; m < columns; m++) {
      const [xr, xi] = a(k, m), cr = coefficients[2 * m]!, ci = coefficients[2 * m + 1]!;
      re += xr * cr - xi * ci;
      im += xr * ci + xi * cr;
    }
    image[2 * k] = re;
    image[2 * k + 1] = im;
  }
  const lu = createDenseLU(rows);
  if (!Number.isFinite(lu.factor(gram))) throw new Error('nearestFormThroughLine: the restriction map is not onto (singular Gram matrix)');
  const y = new Float64Array(2 * rows);
  lu.solve(image, y);
  const out = Float64Array.from(coefficients);
  for (let m = 0; m < columns; m++) {
    for (let k = 0; k < rows; k++) {
      // out_m −= conj(a_km)·y_k
      const [xr, xi] = a(k, m), yr = y[2 * k]!, yi = y[2 * k + 1]!;
      out[2 * m] = out[2 * m]! - (xr * yr + xi * yi);
      out[2 * m + 1] = out[2 * m + 1]! - (xr * yi - xi * yr);
    }
  }
  return out;
}
