import type { PlaneWindow } from '../shared/contour.ts';

/** A real plane map of degree d as its binary-form coefficients: φ(s, t) = Σ_k a_k s^{d−k} t^k, a_k = [x, y, z]. */
export type RealMapCoefficients = readonly (readonly [number, number, number])[];

/**
 * The real map of the parametrised-map formulation (α = 1) from its real unknowns λ, μ, c₁ … c_{d−2} (mapUnknowns order,
 * t_i ignored) and the real points P₁, P₂, P₃: a₀ = P₁, a_k = c_k, a_{d−1} = μP₂ − P₁ − Σ c_k − λP₃, a_d = λP₃ (exact).
 */
export function realMapCoefficients(degree: number, values: readonly number[], q: Readonly<Record<string, number>>): RealMapCoefficients {
  const P = (i: number): [number, number, number] => [q[`px${i}`]!, q[`py${i}`]!, 1];
  const [lambda, mu] = [values[0]!, values[1]!];
  const inner = Array.from({ length: degree - 2 }, (_, k): [number, number, number] => [values[2 + 3 * k]!, values[3 + 3 * k]!, values[4 + 3 * k]!]);
  const last = [0, 1, 2].map((a) => mu * P(2)[a]! - P(1)[a]! - inner.reduce((s, c) => s + c[a]!, 0) - lambda * P(3)[a]!) as [number, number, number];
  return [P(1), ...inner, last, P(3).map((v) => lambda * v) as [number, number, number]];
}

/** φ at the angle θ, (s, t) = (cos θ, sin θ), so θ ∈ [0, π] covers the real projective line once (Horner in t/s form). */
function mapAtAngle(a: RealMapCoefficients, theta: number): [number, number, number] {
  const s = Math.cos(theta), t = Math.sin(theta), d = a.length - 1;
  const out: [number, number, number] = [0, 0, 0];
  a.forEach((c, k) => {
    const w = s ** (d - k) * t ** k;
    out[0] += w * c[0]; out[1] += w * c[1]; out[2] += w * c[2];
  });
  return out;
}

/** The perpendicular distance of p from the segment a–b. */
function distanceToSegment(p: readonly number[], a: readonly number[], b: readonly number[]): number {
  const dx = b[0]! - a[0]!, dy = b[1]! - a[1]!, l2 = dx * dx + dy * dy;
  const u = l2 > 0 ? Math.max(0, Math.min(1, ((p[0]! - a[0]!) * dx + (p[1]! - a[1]!) * dy) / l2)) : 0;
  return Math.hypot(p[0]! - a[0]! - u * dx, p[1]! - a[1]! - u * dy);
}

/** Douglas–Peucker: the points of a run kept so that every dropped one lies within `tolerance` of the kept chord. */
function simplify(run: readonly [number, number][], tolerance: number): [number, number][] {
  if (run.length <= 2) return [...run];
  const keep = new Array<boolean>(run.length).fill(false);
  keep[0] = keep[run.length - 1] = true;
  const stack: [number, number][] = [[0, run.length - 1]];
  while (stack.length > 0) {
    const [i, j] = stack.pop()!;
    let worst = -1, at = -1;
    for (let k = i + 1; k < j; k++) {
      const d = distanceToSegment(run[k]!, run[i]!, run[j]!);
      if (d > worst) { worst = d; at = k; }
    }
    if (worst > tolerance) { keep[at] = true; stack.push([i, at], [at, j]); }
  }
  return run.filter((_, k) => keep[k]);
}

/**
 * The real image of a real map inside `window` widened by 5 % a side, as polylines: the angle θ ∈ [0, π] is sampled at
 * `samples` points and bisected (up to 12 times) wherever two neighbours are more than 1/200 of the window apart; runs
 * break where the curve leaves the widened window or passes through infinity (φ_z changes sign); each run is thinned by
 * Douglas–Peucker to 1/1500 of the window and rounded to the decimal digit at or below 1/10⁵ of it. Isolated real points (nodes with conjugate branches) are not drawn.
 */
export function realMapPolylines(a: RealMapCoefficients, window: PlaneWindow, samples = 720): [number, number][][] {
  const span = Math.max(window.xMax - window.xMin, window.yMax - window.yMin);
  const pad = 0.05 * span, gap = span / 200;
  const inside = (x: number, y: number) => x >= window.xMin - pad && x <= window.xMax + pad && y >= window.yMin - pad && y <= window.yMax + pad;
  const affine = (theta: number) => { const [x, y, z] = mapAtAngle(a, theta); return { x: x / z, y: y / z, z }; };
  type Sample = { theta: number; x: number; y: number; z: number };
  const sampled: Sample[] = [];
  const push = (lo: Sample, hi: Sample, depth: number): void => {
    if (depth < 12 && Math.sign(lo.z) === Math.sign(hi.z) && (inside(lo.x, lo.y) || inside(hi.x, hi.y)) && Math.hypot(hi.x - lo.x, hi.y - lo.y) > gap) {
      const theta = (lo.theta + hi.theta) / 2, mid = { theta, ...affine(theta) };
      push(lo, mid, depth + 1);
      push(mid, hi, depth + 1);
      return;
    }
    sampled.push(hi);
  };
  let previous: Sample = { theta: 0, ...affine(0) };
  sampled.push(previous);
  for (let k = 1; k <= samples; k++) {
    const theta = (Math.PI * k) / samples, next = { theta, ...affine(theta) };
    push(previous, next, 0);
    previous = next;
  }
  const runs: [number, number][][] = [];
  let run: [number, number][] = [];
  sampled.forEach((p, k) => {
    const flips = k > 0 && Math.sign(p.z) !== Math.sign(sampled[k - 1]!.z);
    if (!inside(p.x, p.y) || flips) { if (run.length > 1) runs.push(run); run = []; }
    if (inside(p.x, p.y)) run.push([p.x, p.y]);
  });
  if (run.length > 1) runs.push(run);
  // θ = π is θ = 0 again: a run ending there continues the one starting there.
  const first = runs[0], last = runs.at(-1);
  if (runs.length > 1 && first && last && first[0]![0] === sampled[0]!.x && last.at(-1)![0] === sampled.at(-1)!.x) {
    runs[0] = [...last, ...first.slice(1)];
    runs.pop();
  }
  const digits = Math.max(0, Math.ceil(-Math.log10(span / 1e5)));
  const round = (v: number) => Number(v.toFixed(digits));
  return runs.map((r) => simplify(r, span / 1500).map(([x, y]): [number, number] => [round(x), round(y)]));
}
