import { binomial } from '../shared/binomial.ts';

/**
 * Kontsevich's numbers N_1 … N_maxDegree, exactly: N_d rational plane curves of degree d pass through 3d − 1 general
 * points. N_1 = 1 and, for d ≥ 2, N_d = Σ_{a+b=d, a,b ≥ 1} N_a N_b (a²b² C(3d−4, 3a−2) − a³b C(3d−4, 3a−1))
 * (Kontsevich–Manin 1994, Comm. Math. Phys. 164). Index d − 1 of the result holds N_d.
 */
export function kontsevichNumbers(maxDegree: number): bigint[] {
  if (!Number.isInteger(maxDegree) || maxDegree < 1) throw new RangeError(`kontsevichNumbers: need an integer degree ≥ 1, got ${maxDegree}`);
  const N: bigint[] = [1n];
  for (let d = 2; d <= maxDegree; d++) {
    let sum = 0n;
    for (let a = 1; a < d; a++) {
      const b = d - a, A = BigInt(a), B = BigInt(b);
      sum += N[a - 1]! * N[b - 1]! * (A * A * B * B * binomial(3 * d - 4, 3 * a - 2) - A * A * A * B * binomial(3 * d - 4, 3 * a - 1));
    }
    N.push(sum);
  }
  return N;
}
