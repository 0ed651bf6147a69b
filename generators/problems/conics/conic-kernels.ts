/**
 * Allocation-free complex kernels for plane conics. A conic a·x² + b·xy + c·y² + d·xz + e·yz + f·z² is stored as six
 * packed complex coefficients (a, b, c, d, e, f); its symmetric matrix is [[a, b/2, d/2], [b/2, c, e/2], [d/2, e/2, f]].
 * Points of P² are three packed complex coordinates. All products are plain (bilinear, no conjugation).
 */

/** out[oo..] = M·P for the conic at C[co..] (12 reals) and the point at P[po..] (6 reals). */
export function conicTimesPoint(C: Float64Array, co: number, P: Float64Array, po: number, out: Float64Array, oo: number): void {
  const ar = C[co]!, ai = C[co + 1]!, br = 0.5 * C[co + 2]!, bi = 0.5 * C[co + 3]!, cr = C[co + 4]!, ci = C[co + 5]!;
  const dr = 0.5 * C[co + 6]!, di = 0.5 * C[co + 7]!, er = 0.5 * C[co + 8]!, ei = 0.5 * C[co + 9]!, fr = C[co + 10]!, fi = C[co + 11]!;
  const xr = P[po]!, xi = P[po + 1]!, yr = P[po + 2]!, yi = P[po + 3]!, zr = P[po + 4]!, zi = P[po + 5]!;
  out[oo] = ar * xr - ai * xi + br * yr - bi * yi + dr * zr - di * zi;
  out[oo + 1] = ar * xi + ai * xr + br * yi + bi * yr + dr * zi + di * zr;
  out[oo + 2] = br * xr - bi * xi + cr * yr - ci * yi + er * zr - ei * zi;
  out[oo + 3] = br * xi + bi * xr + cr * yi + ci * yr + er * zi + ei * zr;
  out[oo + 4] = dr * xr - di * xi + er * yr - ei * yi + fr * zr - fi * zi;
  out[oo + 5] = dr * xi + di * xr + er * yi + ei * yr + fr * zi + fi * zr;
}

/** out[oo], out[oo + 1] = f·(a·b), f times the bilinear dot product of two packed complex 3-vectors. */
export function dot3(a: Float64Array, ao: number, b: Float64Array, bo: number, out: Float64Array, oo: number, f = 1): void {
  const a0r = a[ao]!, a0i = a[ao + 1]!, a1r = a[ao + 2]!, a1i = a[ao + 3]!, a2r = a[ao + 4]!, a2i = a[ao + 5]!;
  const b0r = b[bo]!, b0i = b[bo + 1]!, b1r = b[bo + 2]!, b1i = b[bo + 3]!, b2r = b[bo + 4]!, b2i = b[bo + 5]!;
  out[oo] = f * (a0r * b0r - a0i * b0i + a1r * b1r - a1i * b1i + a2r * b2r - a2i * b2i);
  out[oo + 1] = f * (a0r * b0i + a0i * b0r + a1r * b1i + a1i * b1r + a2r * b2i + a2i * b2r);
}

/** out[oo..] = a × b (cross product of packed complex 3-vectors). */
export function cross3(a: Float64Array, ao: number, b: Float64Array, bo: number, out: Float64Array, oo: number): void {
  const a0r = a[ao]!, a0i = a[ao + 1]!, a1r = a[ao + 2]!, a1i = a[ao + 3]!, a2r = a[ao + 4]!, a2i = a[ao + 5]!;
  const b0r = b[bo]!, b0i = b[bo + 1]!, b1r = b[bo + 2]!, b1i = b[bo + 3]!, b2r = b[bo + 4]!, b2i = b[bo + 5]!;
  out[oo] = a1r * b2r - a1i * b2i - (a2r * b1r - a2i * b1i);
  out[oo + 1] = a1r * b2i + a1i * b2r - (a2r * b1i + a2i * b1r);
  out[oo + 2] = a2r * b0r - a2i * b0i - (a0r * b2r - a0i * b2i);
  out[oo + 3] = a2r * b0i + a2i * b0r - (a0r * b2i + a0i * b2r);
  out[oo + 4] = a0r * b1r - a0i * b1i - (a1r * b0r - a1i * b0i);
  out[oo + 5] = a0r * b1i + a0i * b1r - (a1r * b0i + a1i * b0r);
}

/**
 * The six derivatives of gᵀ·M·P with respect to the conic coefficients (a..f), for packed complex 3-vectors g and
 * P: g₀P₀, (g₀P₁ + g₁P₀)/2, g₁P₁, (g₀P₂ + g₂P₀)/2, (g₁P₂ + g₂P₁)/2, g₂P₂, written to out[oo..oo+11].
 * With g = P this gives the monomials x², xy, y², xz, yz, z² (up to the symmetric halves, which sum to the product).
 */
export function coefficientGradient(g: Float64Array, go: number, P: Float64Array, po: number, out: Float64Array, oo: number): void {
  const g0r = g[go]!, g0i = g[go + 1]!, g1r = g[go + 2]!, g1i = g[go + 3]!, g2r = g[go + 4]!, g2i = g[go + 5]!;
  const p0r = P[po]!, p0i = P[po + 1]!, p1r = P[po + 2]!, p1i = P[po + 3]!, p2r = P[po + 4]!, p2i = P[po + 5]!;
  out[oo] = g0r * p0r - g0i * p0i;
  out[oo + 1] = g0r * p0i + g0i * p0r;
  out[oo + 2] = 0.5 * (g0r * p1r - g0i * p1i + g1r * p0r - g1i * p0i);
  out[oo + 3] = 0.5 * (g0r * p1i + g0i * p1r + g1r * p0i + g1i * p0r);
  out[oo + 4] = g1r * p1r - g1i * p1i;
  out[oo + 5] = g1r * p1i + g1i * p1r;
  out[oo + 6] = 0.5 * (g0r * p2r - g0i * p2i + g2r * p0r - g2i * p0i);
  out[oo + 7] = 0.5 * (g0r * p2i + g0i * p2r + g2r * p0i + g2i * p0r);
  out[oo + 8] = 0.5 * (g1r * p2r - g1i * p2i + g2r * p1r - g2i * p1i);
  out[oo + 9] = 0.5 * (g1r * p2i + g1i * p2r + g2r * p1i + g2i * p1r);
  out[oo + 10] = g2r * p2r - g2i * p2i;
  out[oo + 11] = g2r * p2i + g2i * p2r;
}
