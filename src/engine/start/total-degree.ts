import { pow, sub, unknown } from '../expr/build.ts';
import type { StartSystem } from './start-system.ts';
import { cdiv } from '../complex/packed.ts';

/**
 * The total-degree start system G_i = x_i^{d_i} − h^{d_i} (homogenised with h = X_n) with the random chart
 * Σ c_j X_j + c_n·h = 1 (chart: packed, length 2(n + 1)). Its ∏ d_i solutions are x_i = ω_i·h with ω_i a
 * d_i-th root of unity and h = 1/(c_n + Σ c_i ω_i), all nonsingular when that sum is nonzero (true for a
 * generic chart). Path order: the root-of-unity indices (k_0, …, k_{n−1}) in mixed radix, last fastest.
 */
export function totalDegreeStart(degrees: readonly number[], chart: Float64Array): StartSystem {
  const n = degrees.length;
  degrees.forEach((d, i) => {
    if (!(d >= 1)) throw new RangeError(`equation ${i} has degree ${d}; every equation must have degree at least 1`);
  });
  const h = unknown('h0', n);
  const equations = degrees.map((d, i) => sub(pow(unknown(`x${i}`, i), d), pow(h, d)));
  const count = degrees.reduce((p, d) => p * d, 1);
  const N = n + 1;
  const starts = new Float64Array(2 * N * count);
  const digits = new Array<number>(n).fill(0);
  const out = new Float64Array(2);
  for (let path = 0; path < count; path++) {
    let r = path;
    for (let i = n - 1; i >= 0; i--) { digits[i] = r % degrees[i]!; r = Math.floor(r / degrees[i]!); }
    let sRe = chart[2 * n]!, sIm = chart[2 * n + 1]!;
    const base = 2 * N * path;
    for (let i = 0; i < n; i++) {
      const phi = (2 * Math.PI * digits[i]!) / degrees[i]!;
      const wr = Math.cos(phi), wi = Math.sin(phi);
      starts[base + 2 * i] = wr;
      starts[base + 2 * i + 1] = wi;
      sRe += chart[2 * i]! * wr - chart[2 * i + 1]! * wi;
      sIm += chart[2 * i]! * wi + chart[2 * i + 1]! * wr;
    }
    cdiv(out, 0, 1, 0, sRe, sIm);
    const hr = out[0]!, hi = out[1]!;
    for (let i = 0; i < n; i++) {
      const wr = starts[base + 2 * i]!, wi = starts[base + 2 * i + 1]!;
      starts[base + 2 * i] = wr * hr - wi * hi;
      starts[base + 2 * i + 1] = wr * hi + wi * hr;
    }
    starts[base + 2 * n] = hr;
    starts[base + 2 * n + 1] = hi;
  }
  return { equations, count, starts };
}
