// Partial-pivoting elimination kernels on packed complex row-major blocks, shared by the arrowhead solvers.

/**
 * Gaussian elimination with partial pivoting on the first `cols` columns of an r×width complex matrix stored from
 * offset `base`, carrying the remaining columns along; multipliers are stored below the diagonal and row swaps in
 * perm[p0 ..]. Returns the smallest pivot modulus (0 for a zero pivot).
 */
export function eliminate(W: Float64Array, base: number, perm: Int32Array, p0: number, r: number, cols: number, width: number): number {
  let minPivot = Infinity;
  for (let k = 0; k < cols; k++) {
    let best = k, bestAbs = -1;
    for (let i = k; i < r; i++) {
      const re = W[base + 2 * (i * width + k)]!, im = W[base + 2 * (i * width + k) + 1]!;
      const m = re * re + im * im;
      if (m > bestAbs) { bestAbs = m; best = i; }
    }
    if (best !== k) {
      for (let j = 0; j < 2 * width; j++) {
        const t = W[base + 2 * k * width + j]!;
        W[base + 2 * k * width + j] = W[base + 2 * best * width + j]!;
        W[base + 2 * best * width + j] = t;
      }
      const t = perm[p0 + k]!; perm[p0 + k] = perm[p0 + best]!; perm[p0 + best] = t;
    }
    const pr = W[base + 2 * (k * width + k)]!, pi = W[base + 2 * (k * width + k) + 1]!;
    const d = pr * pr + pi * pi;
    const abs = Math.sqrt(d);
    if (abs < minPivot) minPivot = abs;
    if (d === 0) return 0;
    const ir = pr / d, ii = -pi / d;
    for (let i = k + 1; i < r; i++) {
      const o = base + 2 * (i * width + k);
      const ar = W[o]!, ai = W[o + 1]!;
      const lr = ar * ir - ai * ii, li = ar * ii + ai * ir;
      W[o] = lr; W[o + 1] = li;
      if (lr === 0 && li === 0) continue;
      for (let j = k + 1; j < width; j++) {
        const q = base + 2 * (k * width + j), t = base + 2 * (i * width + j);
        const br = W[q]!, bi = W[q + 1]!;
        W[t] = W[t]! - (lr * br - li * bi);
        W[t + 1] = W[t + 1]! - (lr * bi + li * br);
      }
    }
  }
  return minPivot;
}

/** Applies the stored multipliers of the first `cols` eliminations to an (already permuted) right-hand side at R[ro ..]. */
export function forward(W: Float64Array, base: number, R: Float64Array, ro: number, r: number, cols: number, width: number): void {
  for (let k = 0; k < cols; k++) {
    const xr = R[ro + 2 * k]!, xi = R[ro + 2 * k + 1]!;
    for (let i = k + 1; i < r; i++) {
      const o = base + 2 * (i * width + k);
      const lr = W[o]!, li = W[o + 1]!;
      R[ro + 2 * i] = R[ro + 2 * i]! - (lr * xr - li * xi);
      R[ro + 2 * i + 1] = R[ro + 2 * i + 1]! - (lr * xi + li * xr);
    }
  }
}

/**
 * Back substitution for the m×m upper triangle (columns 0..m-1) of W (from `base`), after moving the known trailing
 * unknowns (columns off..off+extra-1, values `known`) to the right-hand side. Solution overwrites R[ro ..].
 */
export function backward(W: Float64Array, base: number, R: Float64Array, ro: number, m: number, width: number, off: number, extra: number, known: Float64Array | null): void {
  for (let k = m - 1; k >= 0; k--) {
    let sr = R[ro + 2 * k]!, si = R[ro + 2 * k + 1]!;
    if (known !== null) {
      for (let j = 0; j < extra; j++) {
        const o = base + 2 * (k * width + off + j);
        const ar = W[o]!, ai = W[o + 1]!, yr = known[2 * j]!, yi = known[2 * j + 1]!;
        sr -= ar * yr - ai * yi;
        si -= ar * yi + ai * yr;
      }
    }
    for (let j = k + 1; j < m; j++) {
      const o = base + 2 * (k * width + j);
      const ar = W[o]!, ai = W[o + 1]!, yr = R[ro + 2 * j]!, yi = R[ro + 2 * j + 1]!;
      sr -= ar * yr - ai * yi;
      si -= ar * yi + ai * yr;
    }
    const o = base + 2 * (k * width + k);
    const pr = W[o]!, pi = W[o + 1]!, d = pr * pr + pi * pi;
    R[ro + 2 * k] = (sr * pr + si * pi) / d;
    R[ro + 2 * k + 1] = (si * pr - sr * pi) / d;
  }
}
