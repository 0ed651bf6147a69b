/**
 * A set of points of ℂⁿ (packed complex) that finds near-duplicates fast: points are bucketed by the real part of a
 * fixed pseudo-random linear projection (cells of width `cell`), and a query compares only the points in its own and
 * the two neighbouring cells. Two points are the same when ‖x − y‖∞ ≤ tolerance · (1 + max(‖x‖∞, ‖y‖∞)).
 */
export interface PointIndex {
  /** Index of a stored point equal to x within tolerance, or −1. */
  find(x: Float64Array): number;
  /** Stores x (not copied) and returns its index; does not check for duplicates. */
  add(x: Float64Array): number;
  readonly size: number;
  readonly points: readonly Float64Array[];
}

/** Creates an empty index for points of length 2n; tolerance default 1e-8 (relative), cell width default 1e-3. */
export function createPointIndex(n: number, tolerance = 1e-8, cell = 1e-3): PointIndex {
  const weights = new Float64Array(2 * n);
  let s = 0x2545f491;
  for (let i = 0; i < 2 * n; i++) {
    s = (Math.imul(s, 1103515245) + 12345) >>> 0;
    weights[i] = (s / 4294967296) * 2 - 1;
  }
  const buckets = new Map<number, number[]>();
  const points: Float64Array[] = [];
  const key = (x: Float64Array): number => {
    let q = 0;
    for (let i = 0; i < 2 * n; i++) q += weights[i]! * x[i]!;
    return Math.floor(q / cell);
  };
  // Squared moduli instead of Math.hypot (several times slower): no overflow below |coordinate| ≈ 1e154.
  const norm2 = (x: Float64Array): number => {
    let m = 0;
    for (let i = 0; i < 2 * n; i += 2) { const a = x[i]! * x[i]! + x[i + 1]! * x[i + 1]!; if (a > m) m = a; }
    return m;
  };
  const same = (x: Float64Array, y: Float64Array): boolean => {
    const scale = tolerance * (1 + Math.sqrt(Math.max(norm2(x), norm2(y)))), scale2 = scale * scale;
    for (let i = 0; i < 2 * n; i += 2) {
      const dr = x[i]! - y[i]!, di = x[i + 1]! - y[i + 1]!;
      if (dr * dr + di * di > scale2) return false;
    }
    return true;
  };
  return {
    find(x) {
      const k = key(x);
      for (let d = -1; d <= 1; d++) {
        const bucket = buckets.get(k + d);
        if (bucket === undefined) continue;
        for (const j of bucket) if (same(x, points[j]!)) return j;
      }
      return -1;
    },
    add(x) {
      const k = key(x);
      const j = points.length;
      points.push(x);
      const bucket = buckets.get(k);
      if (bucket === undefined) buckets.set(k, [j]);
      else bucket.push(j);
      return j;
    },
    get size() { return points.length; },
    points,
  };
}
