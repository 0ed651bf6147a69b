import type { LinearSolver } from '../homotopy.ts';

/**
 * The sparsity of an "arrowhead" Jacobian: a few shared unknowns couple many small private blocks.
 * Each block's equations touch only the shared unknowns and the block's own private unknowns, and a block has at
 * least as many equations as private unknowns; the border equations touch only the shared unknowns. The counts
 * must add up: Σ(equations − unknowns) over blocks + border equations = shared unknowns.
 */
export interface ArrowheadLayout {
  readonly n: number;
  readonly shared: readonly number[];
  readonly blocks: readonly { readonly unknowns: readonly number[]; readonly equations: readonly number[] }[];
  readonly border: readonly number[];
}

/** Checks that a layout partitions the n unknowns and n equations and that its counts add up; throws naming the fault. */
export function checkArrowheadLayout(layout: ArrowheadLayout): void {
  const { n, shared, blocks, border } = layout;
  const cols = [...shared, ...blocks.flatMap((b) => b.unknowns)];
  const rows = [...border, ...blocks.flatMap((b) => b.equations)];
  const isPartition = (xs: number[]): boolean => xs.length === n && new Set(xs).size === n && xs.every((i) => Number.isInteger(i) && i >= 0 && i < n);
  if (!isPartition(cols)) throw new RangeError(`arrowhead layout: unknowns do not partition 0..${n - 1}`);
  if (!isPartition(rows)) throw new RangeError(`arrowhead layout: equations do not partition 0..${n - 1}`);
  blocks.forEach((b, i) => {
    if (b.equations.length < b.unknowns.length) throw new RangeError(`arrowhead layout: block ${i} has fewer equations than unknowns`);
  });
  const schur = border.length + blocks.reduce((s, b) => s + b.equations.length - b.unknowns.length, 0);
  if (schur !== shared.length) throw new RangeError(`arrowhead layout: ${schur} reduced equations for ${shared.length} shared unknowns`);
}

/**
 * A LinearSolver for arrowhead Jacobians (packed complex, row-major n×n): eliminates each private block by LU with
 * partial pivoting, then solves the dense Schur system in the shared unknowns by LU with partial pivoting.
 * Entries outside the declared pattern are ignored (they must be zero). Allocates only at creation.
 * factor() returns ‖A‖∞ (within √2) / (smallest pivot modulus), a cheap condition estimate (a lower bound on κ∞ in exact
 * arithmetic up to the growth factor); Infinity on a zero pivot.
 */
export function createArrowheadSolver(layout: ArrowheadLayout): LinearSolver {
  checkArrowheadLayout(layout);
  const { n, shared, blocks, border } = layout;
  const s = shared.length;
  const w = blocks.map((b) => b.unknowns.length + s); // row width of each block's work matrix
  const work = blocks.map((b, i) => new Float64Array(2 * b.equations.length * w[i]!));
  const perm = blocks.map((b) => new Int32Array(b.equations.length));
  const rhs = blocks.map((b) => new Float64Array(2 * b.equations.length));
  const schur = new Float64Array(2 * s * s);
  const schurPerm = new Int32Array(s);
  const schurRows: { block: number; row: number }[] = []; // where each Schur row comes from (block -1: border)
  border.forEach((r) => schurRows.push({ block: -1, row: r }));
  blocks.forEach((b, i) => {
    for (let k = b.unknowns.length; k < b.equations.length; k++) schurRows.push({ block: i, row: k });
  });
  const xs = new Float64Array(2 * s);
  const out2 = new Float64Array(2 * n);

  return {
    factor(a) {
      let minPivot = Infinity;
      let norm = 0;
      for (let bi = 0; bi < blocks.length; bi++) {
        const b = blocks[bi]!;
        const W = work[bi]!, P = perm[bi]!, width = w[bi]!, r = b.equations.length, p = b.unknowns.length;
        for (let i = 0; i < r; i++) {
          const row = b.equations[i]!;
          P[i] = i;
          for (let j = 0; j < p; j++) copy(a, 2 * (row * n + b.unknowns[j]!), W, 2 * (i * width + j));
          for (let j = 0; j < s; j++) copy(a, 2 * (row * n + shared[j]!), W, 2 * (i * width + p + j));
          const rowSum = absSum(W, 2 * i * width, width);
          if (rowSum > norm) norm = rowSum;
        }
        const piv = eliminate(W, P, r, p, width);
        if (piv < minPivot) minPivot = piv;
      }
      for (let i = 0; i < s; i++) {
        const src = schurRows[i]!;
        if (src.block < 0) {
          for (let j = 0; j < s; j++) copy(a, 2 * (src.row * n + shared[j]!), schur, 2 * (i * s + j));
          const rowSum = absSum(schur, 2 * i * s, s);
          if (rowSum > norm) norm = rowSum;
        } else {
          const W = work[src.block]!, width = w[src.block]!, p = blocks[src.block]!.unknowns.length;
          for (let j = 0; j < s; j++) copy(W, 2 * (src.row * width + p + j), schur, 2 * (i * s + j));
        }
      }
      for (let i = 0; i < s; i++) schurPerm[i] = i;
      const piv = eliminate(schur, schurPerm, s, s, s);
      if (piv < minPivot) minPivot = piv;
      return minPivot === 0 || !Number.isFinite(minPivot) ? Infinity : norm / minPivot;
    },
    solve(b, out) {
      for (let bi = 0; bi < blocks.length; bi++) {
        const blk = blocks[bi]!, R = rhs[bi]!, P = perm[bi]!, W = work[bi]!, width = w[bi]!;
        const r = blk.equations.length, p = blk.unknowns.length;
        for (let i = 0; i < r; i++) copy(b, 2 * blk.equations[P[i]!]!, R, 2 * i);
        forward(W, R, r, p, width);
      }
      for (let i = 0; i < s; i++) {
        const src = schurRows[i]!;
        copy(src.block < 0 ? b : rhs[src.block]!, 2 * src.row, xs, 2 * i);
      }
      // Schur rows from blocks were permuted within the block already; border rows are raw.
      permuteInPlace(xs, schurPerm, s, out2);
      forward(schur, xs, s, s, s);
      backward(schur, xs, s, s, 0, 0, null);
      for (let bi = 0; bi < blocks.length; bi++) {
        const blk = blocks[bi]!, R = rhs[bi]!, W = work[bi]!, width = w[bi]!, p = blk.unknowns.length;
        backward(W, R, p, width, p, s, xs);
        for (let j = 0; j < p; j++) copy(R, 2 * j, out2, 2 * blk.unknowns[j]!);
      }
      for (let j = 0; j < s; j++) copy(xs, 2 * j, out2, 2 * shared[j]!);
      for (let i = 0; i < 2 * n; i++) out[i] = out2[i]!;
    },
  };
}

/** Σ (|re| + |im|) over m complex entries from offset o: the row's 1-norm within a factor √2. */
function absSum(v: Float64Array, o: number, m: number): number {
  let sum = 0;
  for (let j = 0; j < 2 * m; j++) sum += Math.abs(v[o + j]!);
  return sum;
}

function copy(from: Float64Array, i: number, to: Float64Array, j: number): void {
  to[j] = from[i]!;
  to[j + 1] = from[i + 1]!;
}

/** Applies a row permutation (row i of the result is row perm[i] of v) using `tmp` as scratch. */
function permuteInPlace(v: Float64Array, perm: Int32Array, m: number, tmp: Float64Array): void {
  for (let i = 0; i < m; i++) copy(v, 2 * perm[i]!, tmp, 2 * i);
  for (let i = 0; i < 2 * m; i++) v[i] = tmp[i]!;
}

/**
 * Gaussian elimination with partial pivoting on the first `cols` columns of an r×width complex matrix, carrying the
 * remaining columns along; multipliers are stored below the diagonal and row swaps in perm. Returns the smallest
 * pivot modulus (0 for a zero pivot).
 */
function eliminate(W: Float64Array, perm: Int32Array, r: number, cols: number, width: number): number {
  let minPivot = Infinity;
  for (let k = 0; k < cols; k++) {
    let best = k, bestAbs = -1;
    for (let i = k; i < r; i++) {
      const re = W[2 * (i * width + k)]!, im = W[2 * (i * width + k) + 1]!;
      const m = re * re + im * im;
      if (m > bestAbs) { bestAbs = m; best = i; }
    }
    if (best !== k) {
      for (let j = 0; j < 2 * width; j++) {
        const t = W[2 * k * width + j]!;
        W[2 * k * width + j] = W[2 * best * width + j]!;
        W[2 * best * width + j] = t;
      }
      const t = perm[k]!; perm[k] = perm[best]!; perm[best] = t;
    }
    const pr = W[2 * (k * width + k)]!, pi = W[2 * (k * width + k) + 1]!;
    const d = pr * pr + pi * pi;
    const abs = Math.sqrt(d);
    if (abs < minPivot) minPivot = abs;
    if (d === 0) return 0;
    const ir = pr / d, ii = -pi / d;
    for (let i = k + 1; i < r; i++) {
      const o = 2 * (i * width + k);
      const ar = W[o]!, ai = W[o + 1]!;
      const lr = ar * ir - ai * ii, li = ar * ii + ai * ir;
      W[o] = lr; W[o + 1] = li;
      if (lr === 0 && li === 0) continue;
      for (let j = k + 1; j < width; j++) {
        const q = 2 * (k * width + j), t = 2 * (i * width + j);
        const br = W[q]!, bi = W[q + 1]!;
        W[t] = W[t]! - (lr * br - li * bi);
        W[t + 1] = W[t + 1]! - (lr * bi + li * br);
      }
    }
  }
  return minPivot;
}

/** Applies the stored multipliers of the first `cols` eliminations to an (already permuted) right-hand side. */
function forward(W: Float64Array, R: Float64Array, r: number, cols: number, width: number): void {
  for (let k = 0; k < cols; k++) {
    const xr = R[2 * k]!, xi = R[2 * k + 1]!;
    for (let i = k + 1; i < r; i++) {
      const o = 2 * (i * width + k);
      const lr = W[o]!, li = W[o + 1]!;
      R[2 * i] = R[2 * i]! - (lr * xr - li * xi);
      R[2 * i + 1] = R[2 * i + 1]! - (lr * xi + li * xr);
    }
  }
}

/**
 * Back substitution for the m×m upper triangle (columns 0..m-1) of W, after moving the known trailing unknowns
 * (columns off..off+extra-1 of W, values `known`) to the right-hand side. Solution overwrites R[0..m-1].
 */
function backward(W: Float64Array, R: Float64Array, m: number, width: number, off: number, extra: number, known: Float64Array | null): void {
  for (let k = m - 1; k >= 0; k--) {
    let sr = R[2 * k]!, si = R[2 * k + 1]!;
    if (known !== null) {
      for (let j = 0; j < extra; j++) {
        const o = 2 * (k * width + off + j);
        const ar = W[o]!, ai = W[o + 1]!, yr = known[2 * j]!, yi = known[2 * j + 1]!;
        sr -= ar * yr - ai * yi;
        si -= ar * yi + ai * yr;
      }
    }
    for (let j = k + 1; j < m; j++) {
      const o = 2 * (k * width + j);
      const ar = W[o]!, ai = W[o + 1]!, yr = R[2 * j]!, yi = R[2 * j + 1]!;
      sr -= ar * yr - ai * yi;
      si -= ar * yi + ai * yr;
    }
    const o = 2 * (k * width + k);
    const pr = W[o]!, pi = W[o + 1]!, d = pr * pr + pi * pi;
    R[2 * k] = (sr * pr + si * pi) / d;
    R[2 * k + 1] = (si * pr - sr * pi) / d;
  }
}
