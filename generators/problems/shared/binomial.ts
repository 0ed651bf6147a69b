/** The binomial coefficient C(n, k) as an exact bigint; 0 when k < 0 or k > n (n, k integers, n ≥ 0). */
export function binomial(n: number, k: number): bigint {
  if (k < 0 || k > n) return 0n;
  const m = Math.min(k, n - k);
  let value = 1n;
  for (let i = 1; i <= m; i++) value = (value * BigInt(n - m + i)) / BigInt(i);
  return value;
}
