/**
 * The degree of the Grassmannian G(k, n) of k-dimensional subspaces of n-space in its Plücker embedding, exactly:
 * the number of standard Young tableaux of the k × (n − k) rectangle, by the hook length formula
 * (k(n−k))! / ∏ hook(i, j), where the cell in row i, column j (from 0) of the rectangle has hook (k − i) + (n − k − j) − 1.
 * It is the number of k-planes meeting k(n − k) general (n − k)-planes nontrivially. Requires 0 ≤ k ≤ n (integers).
 */
export function grassmannianDegree(k: number, n: number): bigint {
  if (!Number.isInteger(k) || !Number.isInteger(n) || k < 0 || k > n) throw new RangeError(`grassmannianDegree: need integers 0 ≤ k ≤ n, got k = ${k}, n = ${n}`);
  const columns = n - k;
  let cells = 1n, hooks = 1n;
  for (let c = 1; c <= k * columns; c++) cells *= BigInt(c);
  for (let i = 0; i < k; i++) for (let j = 0; j < columns; j++) hooks *= BigInt(k - i + columns - j - 1);
  return cells / hooks;
}
