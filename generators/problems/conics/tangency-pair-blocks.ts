import { checkArrowheadLayout, createArrowheadSolver, pivotedBackward as backward, pivotedEliminate as eliminate, pivotedForward as forward, type ArrowheadLayout, type LinearSolver } from '../../../src/engine/index.ts';

// Per-block factor record (reals): multipliers l1, l2 (column 0), l3 (column 1), pivots u00, u11, the entry u01,
// then the two upper rows S0, S1 over the shared unknowns.
const L1 = 0, L2 = 2, L3 = 4, U00 = 6, U01 = 8, U11 = 10, S0 = 12;

/**
 * The engine's arrowhead solver specialised to blocks of 3 equations in 2 private unknowns (the tangency points of the
 * conic problems): the same partial-pivoting elimination, operation for operation, as the generic one (results agree to
 * the last bit), written out without index tables or generic loops over the private columns. Null for any other
 * layout. Allocates only at creation; factor() returns the same ‖A‖∞ / (smallest pivot) estimate as the generic one;
 * factorOnly() skips that estimate (false when a pivot is zero or not finite).
 */
export function createPairBlockSolver(layout: ArrowheadLayout): LinearSolver | null {
  const { n, shared, blocks, border } = layout;
  if (blocks.length === 0 || blocks.some((b) => b.equations.length !== 3 || b.unknowns.length !== 2)) return null;
  const s = shared.length, nb = blocks.length, nbr = border.length, stride = S0 + 4 * s;
  const rows = Int32Array.from(blocks.flatMap((b) => b.equations)), cols = Int32Array.from(blocks.flatMap((b) => b.unknowns));
  const order = new Int32Array(3 * nb), F = new Float64Array(stride * nb);
  const sc = Int32Array.from(shared, (c) => 2 * c), borderRows = Int32Array.from(border);
  const schur = new Float64Array(2 * s * s), schurPerm = new Int32Array(s), xs = new Float64Array(2 * s), rhs = new Float64Array(2 * s);
  const y = new Float64Array(4 * nb);

  /** Row sum of |re| + |im| over the block row at offset o (private columns c0, c1, then the shared ones). */
  function rowSum(a: Float64Array, o: number, c0: number, c1: number): number {
    let sum = Math.abs(a[o + c0]!) + Math.abs(a[o + c0 + 1]!) + Math.abs(a[o + c1]!) + Math.abs(a[o + c1 + 1]!);
    for (let j = 0; j < s; j++) sum += Math.abs(a[o + sc[j]!]!) + Math.abs(a[o + sc[j]! + 1]!);
    return sum;
  }

  /** Factors a; returns ‖A‖∞ / (smallest pivot) when withNorm, else 1 / (smallest pivot); Infinity when singular. */
  function factorize(a: Float64Array, withNorm: boolean): number {
    let minPivot = Infinity, norm = withNorm ? 0 : 1;
    for (let bi = 0; bi < nb; bi++) {
      const c0 = 2 * cols[2 * bi]!, c1 = 2 * cols[2 * bi + 1]!, f = stride * bi;
      let oA = 2 * n * rows[3 * bi]!, oB = 2 * n * rows[3 * bi + 1]!, oC = 2 * n * rows[3 * bi + 2]!;
      let rA = 0, rB = 1, rC = 2;
      if (withNorm) norm = Math.max(norm, rowSum(a, oA, c0, c1), rowSum(a, oB, c0, c1), rowSum(a, oC, c0, c1));
      let a0r = a[oA + c0]!, a0i = a[oA + c0 + 1]!, a1r = a[oA + c1]!, a1i = a[oA + c1 + 1]!;
      let b0r = a[oB + c0]!, b0i = a[oB + c0 + 1]!, b1r = a[oB + c1]!, b1i = a[oB + c1 + 1]!;
      let c0r = a[oC + c0]!, c0i = a[oC + c0 + 1]!, c1r = a[oC + c1]!, c1i = a[oC + c1 + 1]!;
      // Pivot in column 0 (first largest modulus wins, as in the generic elimination).
      const mA = a0r * a0r + a0i * a0i, mB = b0r * b0r + b0i * b0i, mC = c0r * c0r + c0i * c0i;
      let t: number;
      if (mC > mA && mC > mB) { // swap A and C
        t = oA; oA = oC; oC = t; t = rA; rA = rC; rC = t;
        t = a0r; a0r = c0r; c0r = t; t = a0i; a0i = c0i; c0i = t; t = a1r; a1r = c1r; c1r = t; t = a1i; a1i = c1i; c1i = t;
      } else if (mB > mA) { // swap A and B
        t = oA; oA = oB; oB = t; t = rA; rA = rB; rB = t;
        t = a0r; a0r = b0r; b0r = t; t = a0i; a0i = b0i; b0i = t; t = a1r; a1r = b1r; b1r = t; t = a1i; a1i = b1i; b1i = t;
      }
      const d0 = a0r * a0r + a0i * a0i;
      if (d0 === 0) return Infinity;
      minPivot = Math.min(minPivot, Math.sqrt(d0));
      const i0r = a0r / d0, i0i = -a0i / d0;
      let lBr = b0r * i0r - b0i * i0i, lBi = b0r * i0i + b0i * i0r;
      let lCr = c0r * i0r - c0i * i0i, lCi = c0r * i0i + c0i * i0r;
      b1r = b1r - (lBr * a1r - lBi * a1i); b1i = b1i - (lBr * a1i + lBi * a1r);
      c1r = c1r - (lCr * a1r - lCi * a1i); c1i = c1i - (lCr * a1i + lCi * a1r);
      // Pivot in column 1 among the two lower rows.
      if (c1r * c1r + c1i * c1i > b1r * b1r + b1i * b1i) {
        t = oB; oB = oC; oC = t; t = rB; rB = rC; rC = t;
        t = lBr; lBr = lCr; lCr = t; t = lBi; lBi = lCi; lCi = t; t = b1r; b1r = c1r; c1r = t; t = b1i; b1i = c1i; c1i = t;
      }
      const d1 = b1r * b1r + b1i * b1i;
      if (d1 === 0) return Infinity;
      minPivot = Math.min(minPivot, Math.sqrt(d1));
      const i1r = b1r / d1, i1i = -b1i / d1;
      const l3r = c1r * i1r - c1i * i1i, l3i = c1r * i1i + c1i * i1r;
      order[3 * bi] = rows[3 * bi + rA]!; order[3 * bi + 1] = rows[3 * bi + rB]!; order[3 * bi + 2] = rows[3 * bi + rC]!;
      F[f + L1] = lBr; F[f + L1 + 1] = lBi; F[f + L2] = lCr; F[f + L2 + 1] = lCi; F[f + L3] = l3r; F[f + L3 + 1] = l3i;
      F[f + U00] = a0r; F[f + U00 + 1] = a0i; F[f + U01] = a1r; F[f + U01 + 1] = a1i; F[f + U11] = b1r; F[f + U11 + 1] = b1i;
      // Shared columns: S0 = row A, S1 = row B − lB·S0, Schur row = (row C − lC·S0) − l3·S1.
      const q = 2 * s * (nbr + bi);
      for (let j = 0, g = f + S0, h = f + S0 + 2 * s; j < s; j++, g += 2, h += 2) {
        const cj = sc[j]!;
        const s0r = a[oA + cj]!, s0i = a[oA + cj + 1]!;
        const s1r = a[oB + cj]! - (lBr * s0r - lBi * s0i), s1i = a[oB + cj + 1]! - (lBr * s0i + lBi * s0r);
        const s2r = a[oC + cj]! - (lCr * s0r - lCi * s0i), s2i = a[oC + cj + 1]! - (lCr * s0i + lCi * s0r);
        F[g] = s0r; F[g + 1] = s0i; F[h] = s1r; F[h + 1] = s1i;
        schur[q + 2 * j] = s2r - (l3r * s1r - l3i * s1i);
        schur[q + 2 * j + 1] = s2i - (l3r * s1i + l3i * s1r);
      }
    }
    for (let i = 0; i < nbr; i++) {
      const o = 2 * n * borderRows[i]!;
      let sum = 0;
      for (let j = 0; j < s; j++) {
        const re = a[o + sc[j]!]!, im = a[o + sc[j]! + 1]!;
        schur[2 * (i * s + j)] = re; schur[2 * (i * s + j) + 1] = im;
        sum += Math.abs(re) + Math.abs(im);
      }
      if (withNorm && sum > norm) norm = sum;
    }
    for (let i = 0; i < s; i++) schurPerm[i] = i;
    const piv = eliminate(schur, 0, schurPerm, 0, s, s, s);
    if (piv < minPivot) minPivot = piv;
    return minPivot === 0 || !Number.isFinite(minPivot) ? Infinity : norm / minPivot;
  }

  return {
    factor: (a) => factorize(a, true),
    factorOnly: (a) => Number.isFinite(factorize(a, false)),
    solve(b, out) {
      for (let i = 0; i < nbr; i++) { rhs[2 * i] = b[2 * borderRows[i]!]!; rhs[2 * i + 1] = b[2 * borderRows[i]! + 1]!; }
      for (let bi = 0; bi < nb; bi++) {
        const f = stride * bi, oA = 2 * order[3 * bi]!, oB = 2 * order[3 * bi + 1]!, oC = 2 * order[3 * bi + 2]!;
        const xAr = b[oA]!, xAi = b[oA + 1]!;
        const lBr = F[f + L1]!, lBi = F[f + L1 + 1]!, lCr = F[f + L2]!, lCi = F[f + L2 + 1]!, l3r = F[f + L3]!, l3i = F[f + L3 + 1]!;
        const xBr = b[oB]! - (lBr * xAr - lBi * xAi), xBi = b[oB + 1]! - (lBr * xAi + lBi * xAr);
        let xCr = b[oC]! - (lCr * xAr - lCi * xAi), xCi = b[oC + 1]! - (lCr * xAi + lCi * xAr);
        xCr = xCr - (l3r * xBr - l3i * xBi); xCi = xCi - (l3r * xBi + l3i * xBr);
        y[4 * bi] = xAr; y[4 * bi + 1] = xAi; y[4 * bi + 2] = xBr; y[4 * bi + 3] = xBi;
        rhs[2 * (nbr + bi)] = xCr; rhs[2 * (nbr + bi) + 1] = xCi;
      }
      for (let i = 0; i < s; i++) { xs[2 * i] = rhs[2 * schurPerm[i]!]!; xs[2 * i + 1] = rhs[2 * schurPerm[i]! + 1]!; }
      forward(schur, 0, xs, 0, s, s, s);
      backward(schur, 0, xs, 0, s, s, 0, 0, null);
      // Every read of b is done: write the solution straight into out (which may alias b).
      for (let bi = 0; bi < nb; bi++) {
        const f = stride * bi;
        let s0r = y[4 * bi]!, s0i = y[4 * bi + 1]!, s1r = y[4 * bi + 2]!, s1i = y[4 * bi + 3]!;
        for (let j = 0, g = f + S0, h = f + S0 + 2 * s; j < s; j++, g += 2, h += 2) {
          const zr = xs[2 * j]!, zi = xs[2 * j + 1]!;
          s1r -= F[h]! * zr - F[h + 1]! * zi; s1i -= F[h]! * zi + F[h + 1]! * zr;
        }
        const pr = F[f + U11]!, pi = F[f + U11 + 1]!, d1 = pr * pr + pi * pi;
        const y1r = (s1r * pr + s1i * pi) / d1, y1i = (s1i * pr - s1r * pi) / d1;
        for (let j = 0, g = f + S0; j < s; j++, g += 2) {
          const zr = xs[2 * j]!, zi = xs[2 * j + 1]!;
          s0r -= F[g]! * zr - F[g + 1]! * zi; s0i -= F[g]! * zi + F[g + 1]! * zr;
        }
        const ur = F[f + U01]!, ui = F[f + U01 + 1]!;
        s0r -= ur * y1r - ui * y1i; s0i -= ur * y1i + ui * y1r;
        const qr = F[f + U00]!, qi = F[f + U00 + 1]!, d0 = qr * qr + qi * qi;
        const c0 = 2 * cols[2 * bi]!, c1 = 2 * cols[2 * bi + 1]!;
        out[c0] = (s0r * qr + s0i * qi) / d0; out[c0 + 1] = (s0i * qr - s0r * qi) / d0;
        out[c1] = y1r; out[c1 + 1] = y1i;
      }
      for (let j = 0; j < s; j++) { out[sc[j]!] = xs[2 * j]!; out[sc[j]! + 1] = xs[2 * j + 1]!; }
    },
  };
}

/** The tangency formulation's linear solver: the 3×2-block solver when every block is 3×2, else the engine's general one (layout checked first). */
export function createTangencySolver(layout: ArrowheadLayout): LinearSolver {
  checkArrowheadLayout(layout);
  return createPairBlockSolver(layout) ?? createArrowheadSolver(layout);
}
