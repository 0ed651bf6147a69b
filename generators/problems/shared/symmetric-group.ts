/** n! as decimal digits (exact, BigInt). */
export function factorialDigits(n: number): string {
  let f = 1n;
  for (let k = 2n; k <= BigInt(n); k++) f *= k;
  return f.toString();
}

/** The name of the symmetric group on n letters with a Unicode subscript: 'S₉', 'S₁₂'. */
export function symmetricGroupName(n: number): string {
  return `S${String(n).replace(/[0-9]/g, (d) => '₀₁₂₃₄₅₆₇₈₉'[Number(d)]!)}`;
}
