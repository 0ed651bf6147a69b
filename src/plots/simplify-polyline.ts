/**
 * Douglas–Peucker (Douglas and Peucker, The Canadian Cartographer 10, 1973) over any point type: keeps the first and
 * last point and every point needed so that no dropped point lies farther than `tolerance` from the kept polyline,
 * as measured by `offset(p, a, b)` (the distance of p from the piece a–b). Iterative (no recursion depth limit);
 * deterministic; returns a new array of the kept points in order.
 */
export function simplifyPolyline<P>(points: readonly P[], tolerance: number, offset: (p: P, a: P, b: P) => number): P[] {
  if (points.length <= 2) return [...points];
  const keep = new Uint8Array(points.length);
  keep[0] = 1; keep[points.length - 1] = 1;
  const stack: [number, number][] = [[0, points.length - 1]];
  while (stack.length > 0) {
    const [i, j] = stack.pop()!;
    let worst = -1, far = 0;
    for (let k = i + 1; k < j; k++) {
      const d = offset(points[k]!, points[i]!, points[j]!);
      if (d > far) { far = d; worst = k; }
    }
    if (worst >= 0 && far > tolerance) { keep[worst] = 1; stack.push([i, worst], [worst, j]); }
  }
  return points.filter((_, k) => keep[k] === 1);
}
