/**
 * A vector c with cᵀM = 0 for a real square matrix M (rows given) that is singular or nearly so: Gaussian elimination
 * of Mᵀ with complete pivoting, the last (smallest) pivot taken as zero, back substitution with that unknown = 1,
 * scaled to largest entry 1 in absolute value. Accurate to about cond(M) · 1e-16 relative when the rank is n − 1.
 */
export function leftNullVector(rows: readonly (readonly number[])[]): number[] {
  const n = rows.length;
  const a = rows[0]!.map((_, i) => rows.map((row) => row[i]!)); // Mᵀ
  const order = Array.from({ length: n }, (_, i) => i); // column permutation
  for (let k = 0; k < n - 1; k++) {
    let pr = k, pc = k;
    for (let i = k; i < n; i++) for (let j = k; j < n; j++) if (Math.abs(a[i]![j]!) > Math.abs(a[pr]![pc]!)) { pr = i; pc = j; }
    [a[k], a[pr]] = [a[pr]!, a[k]!];
    for (const row of a) [row[k], row[pc]] = [row[pc]!, row[k]!];
    [order[k], order[pc]] = [order[pc]!, order[k]!];
    for (let i = k + 1; i < n; i++) {
      const f = a[i]![k]! / a[k]![k]!;
      for (let j = k; j < n; j++) a[i]![j]! -= f * a[k]![j]!;
    }
  }
  const y = new Array<number>(n).fill(0);
  y[n - 1] = 1;
  for (let k = n - 2; k >= 0; k--) {
    let s = 0;
    for (let j = k + 1; j < n; j++) s += a[k]![j]! * y[j]!;
    y[k] = -s / a[k]![k]!;
  }
  const c = new Array<number>(n).fill(0);
  order.forEach((col, k) => (c[col] = y[k]!));
  const largest = Math.max(...c.map(Math.abs));
  return c.map((v) => v / largest);
}
