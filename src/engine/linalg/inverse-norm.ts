/** What the estimator needs: solves with A and with Aᴴ for a factored n×n matrix. */
interface FactoredMatrix {
  solve(b: Float64Array, out: Float64Array): void;
  solveAdjoint(b: Float64Array, out: Float64Array): void;
}

const buffers = new Map<number, { x: Float64Array; y: Float64Array }>();

/**
 * Estimates ‖A⁻¹‖₁ by Hager's method in Higham's complex form (Higham, ACM TOMS 14, 1988, Alg. 4.1) with at
 * most three sweeps of one solve and one adjoint solve each. The result is a lower bound of ‖A⁻¹‖₁ that is
 * exact or within a small factor in practice. Scratch buffers are cached per size (allocation-free after the first call).
 */
export function estimateInverseNorm1(a: FactoredMatrix, n: number): number {
  let buf = buffers.get(n);
  if (buf === undefined) {
    buf = { x: new Float64Array(2 * n), y: new Float64Array(2 * n) };
    buffers.set(n, buf);
  }
  const { x, y } = buf;
  for (let i = 0; i < n; i++) { x[2 * i] = 1 / n; x[2 * i + 1] = 0; }
  let estimate = 0;
  let lastJ = -1;
  for (let sweep = 0; sweep < 3; sweep++) {
    a.solve(x, y);
    let norm = 0;
    for (let i = 0; i < n; i++) norm += Math.hypot(y[2 * i]!, y[2 * i + 1]!);
    if (!Number.isFinite(norm)) return Infinity;
    if (sweep > 0 && norm <= estimate) break;
    estimate = norm;
    for (let i = 0; i < n; i++) {
      const m = Math.hypot(y[2 * i]!, y[2 * i + 1]!);
      if (m > 0) { y[2 * i] = y[2 * i]! / m; y[2 * i + 1] = y[2 * i + 1]! / m; } else { y[2 * i] = 1; y[2 * i + 1] = 0; }
    }
    a.solveAdjoint(y, y);
    let j = 0, best = -1;
    for (let i = 0; i < n; i++) {
      const m = y[2 * i]! * y[2 * i]! + y[2 * i + 1]! * y[2 * i + 1]!;
      if (m > best) { best = m; j = i; }
    }
    if (j === lastJ) break;
    lastJ = j;
    x.fill(0);
    x[2 * j] = 1;
  }
  return estimate;
}
