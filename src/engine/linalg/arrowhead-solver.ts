import type { LinearSolver } from '../homotopy.ts';
import { backward, eliminate, forward } from './pivoted-elimination.ts';

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
 * Entries outside the declared pattern are ignored (they must be zero). Allocates only at creation. Any block sizes; a
 * family may supply a specialised solver for its own block shape (the conic family's tangency-pair-blocks.ts).
 * factor() returns ‖A‖∞ (within √2) / (smallest pivot modulus), a cheap condition estimate (a lower bound on κ∞ in exact
 * arithmetic up to the growth factor); Infinity on a zero pivot.
 */
export function createArrowheadSolver(layout: ArrowheadLayout): LinearSolver {
  checkArrowheadLayout(layout);
  const { n, shared, blocks, border } = layout;
  const s = shared.length, nb = blocks.length;
  // Flat per-block descriptions: rows r, private unknowns p, row width p + s, offsets into the flat buffers.
  const R = Int32Array.from(blocks, (b) => b.equations.length), Pn = Int32Array.from(blocks, (b) => b.unknowns.length);
  const W0 = new Int32Array(nb + 1), R0 = new Int32Array(nb + 1), P0 = new Int32Array(nb + 1);
  for (let i = 0; i < nb; i++) { W0[i + 1] = W0[i]! + 2 * R[i]! * (Pn[i]! + s); R0[i + 1] = R0[i]! + R[i]!; P0[i + 1] = P0[i]! + Pn[i]!; }
  const work = new Float64Array(W0[nb]!), rhs = new Float64Array(2 * R0[nb]!), perm = new Int32Array(R0[nb]!);
  const eqs = Int32Array.from(blocks.flatMap((b) => b.equations)), privateCols = Int32Array.from(blocks.flatMap((b) => b.unknowns));
  // gather[k]: offset in the packed matrix of the k-th complex entry of the work buffer, then of the border rows.
  const gather = new Int32Array(W0[nb]! / 2 + border.length * s);
  let g = 0;
  blocks.forEach((b) => b.equations.forEach((row) => { for (const c of [...b.unknowns, ...shared]) gather[g++] = 2 * (row * n + c); }));
  border.forEach((row) => { for (const c of shared) gather[g++] = 2 * (row * n + c); });
  const schur = new Float64Array(2 * s * s), schurPerm = new Int32Array(s);
  // Schur row i comes from work row schurSource[i] (an index of the flat rhs) or, when negative, border row −1 − k.
  const schurSource = new Int32Array(s);
  let q = 0;
  border.forEach((row) => { schurSource[q++] = -1 - row; });
  blocks.forEach((b, i) => { for (let k = b.unknowns.length; k < b.equations.length; k++) schurSource[q++] = R0[i]! + k; });
  const xs = new Float64Array(2 * s), out2 = new Float64Array(2 * s);
  const sharedIdx = Int32Array.from(shared);

  return {
    factor(a) {
      let minPivot = Infinity, norm = 0, k = 0;
      for (let bi = 0; bi < nb; bi++) {
        const width = Pn[bi]! + s, base = W0[bi]!;
        for (let i = 0; i < R[bi]!; i++) {
          perm[R0[bi]! + i] = i;
          let rowSum = 0;
          for (let j = 0; j < width; j++, k++) {
            const src = gather[k]!, re = a[src]!, im = a[src + 1]!;
            work[base + 2 * (i * width + j)] = re;
            work[base + 2 * (i * width + j) + 1] = im;
            rowSum += Math.abs(re) + Math.abs(im);
          }
          if (rowSum > norm) norm = rowSum;
        }
        const piv = eliminate(work, base, perm, R0[bi]!, R[bi]!, Pn[bi]!, width);
        if (piv < minPivot) minPivot = piv;
      }
      let border0 = k;
      for (let i = 0; i < s; i++) {
        const src = schurSource[i]!;
        if (src < 0) {
          let rowSum = 0;
          for (let j = 0; j < s; j++, border0++) {
            const o = gather[border0]!, re = a[o]!, im = a[o + 1]!;
            schur[2 * (i * s + j)] = re;
            schur[2 * (i * s + j) + 1] = im;
            rowSum += Math.abs(re) + Math.abs(im);
          }
          if (rowSum > norm) norm = rowSum;
        } else {
          const bi = blockOf(R0, src), width = Pn[bi]! + s, o = W0[bi]! + 2 * ((src - R0[bi]!) * width + Pn[bi]!);
          for (let j = 0; j < 2 * s; j++) schur[2 * i * s + j] = work[o + j]!;
        }
      }
      for (let i = 0; i < s; i++) schurPerm[i] = i;
      const piv = eliminate(schur, 0, schurPerm, 0, s, s, s);
      if (piv < minPivot) minPivot = piv;
      return minPivot === 0 || !Number.isFinite(minPivot) ? Infinity : norm / minPivot;
    },
    solve(b, out) {
      for (let bi = 0; bi < nb; bi++) {
        const r0 = R0[bi]!;
        for (let i = 0; i < R[bi]!; i++) copy(b, 2 * eqs[r0 + perm[r0 + i]!]!, rhs, 2 * (r0 + i));
        forward(work, W0[bi]!, rhs, 2 * r0, R[bi]!, Pn[bi]!, Pn[bi]! + s);
      }
      for (let i = 0; i < s; i++) {
        const src = schurSource[i]!;
        if (src < 0) copy(b, 2 * (-1 - src), out2, 2 * i);
        else copy(rhs, 2 * src, out2, 2 * i);
      }
      for (let i = 0; i < s; i++) copy(out2, 2 * schurPerm[i]!, xs, 2 * i);
      forward(schur, 0, xs, 0, s, s, s);
      backward(schur, 0, xs, 0, s, s, 0, 0, null);
      // Every read of b is done: write the solution straight into out (which may alias b).
      for (let bi = 0; bi < nb; bi++) {
        const r0 = R0[bi]!, p = Pn[bi]!;
        backward(work, W0[bi]!, rhs, 2 * r0, p, p + s, p, s, xs);
        for (let j = 0; j < p; j++) copy(rhs, 2 * (r0 + j), out, 2 * privateCols[P0[bi]! + j]!);
      }
      for (let j = 0; j < s; j++) copy(xs, 2 * j, out, 2 * sharedIdx[j]!);
    },
  };
}

/** The block whose flat row range [R0[i], R0[i+1]) holds row index `row`. */
function blockOf(R0: Int32Array, row: number): number {
  let i = 0;
  while (R0[i + 1]! <= row) i++;
  return i;
}


function copy(from: Float64Array, i: number, to: Float64Array, j: number): void {
  to[j] = from[i]!;
  to[j + 1] = from[i + 1]!;
}
