/**
 * The linear map from a form's coefficients to its restriction to the line p + s·q: a packed complex row-major
 * (d+1)×M matrix whose entry (k, m) is the coefficient of s^k in Π_i (p_i + s·q_i)^{e_i} for exponents[m] = e
 * (all of total degree d). Plain products in binary64; p and q packed complex.
 */
export function restrictionMatrix(exponents: readonly (readonly number[])[], p: Float64Array, q: Float64Array): Float64Array {
  const degree = exponents[0]!.reduce((s, k) => s + k, 0);
  const columns = exponents.length;
  const out = new Float64Array(2 * (degree + 1) * columns);
  const poly = new Float64Array(2 * (degree + 1));
  exponents.forEach((e, m) => {
    poly.fill(0);
    poly[0] = 1;
    let length = 1;
    e.forEach((power, i) => {
      const pr = p[2 * i]!, pi = p[2 * i + 1]!, qr = q[2 * i]!, qi = q[2 * i + 1]!;
      for (let t = 0; t < power; t++) {
        // poly ← poly·(p_i + s·q_i), from the top coefficient down so that each old entry is read before it is overwritten
        for (let k = length; k >= 0; k--) {
          const ar = k < length ? poly[2 * k]! : 0, ai = k < length ? poly[2 * k + 1]! : 0;
          const br = k > 0 ? poly[2 * k - 2]! : 0, bi = k > 0 ? poly[2 * k - 1]! : 0;
          poly[2 * k] = ar * pr - ai * pi + br * qr - bi * qi;
          poly[2 * k + 1] = ar * pi + ai * pr + br * qi + bi * qr;
        }
        length++;
      }
    });
    for (let k = 0; k <= degree; k++) {
      out[2 * (k * columns + m)] = poly[2 * k]!;
      out[2 * (k * columns + m) + 1] = poly[2 * k + 1]!;
    }
  });
  return out;
}
