/**
 * Real plane-conic helpers for drawing (plain numbers, not hot): coefficients (a, b, c, d, e, f) of
 * a·x² + b·xy + c·y² + d·x + e·y + f.
 */
export type ConicCoefficients = [number, number, number, number, number, number];

/** The ellipse with centre (cx, cy), semi-axes p, q and the first axis turned by `angle` radians. */
export function ellipseCoefficients(cx: number, cy: number, p: number, q: number, angle: number): ConicCoefficients {
  const c = Math.cos(angle), s = Math.sin(angle);
  // ((X c + Y s)/p)² + ((−X s + Y c)/q)² = 1 with X = x − cx, Y = y − cy.
  const A = c * c / (p * p) + s * s / (q * q), B = 2 * c * s * (1 / (p * p) - 1 / (q * q)), C = s * s / (p * p) + c * c / (q * q);
  return [A, B, C, -2 * A * cx - B * cy, -B * cx - 2 * C * cy, A * cx * cx + B * cx * cy + C * cy * cy - 1];
}

function matrix([a, b, c, d, e, f]: readonly number[]): number[][] {
  return [[a!, b! / 2, d! / 2], [b! / 2, c!, e! / 2], [d! / 2, e! / 2, f!]];
}

/** Coefficients k₀..k₃ of det(A + t·U) for 3×3 matrices (exact polynomial arithmetic on the entries). */
function pencilDeterminant(A: number[][], U: number[][]): number[] {
  const mul = (p: number[], q: number[]): number[] => {
    const r = new Array(p.length + q.length - 1).fill(0);
    p.forEach((x, i) => q.forEach((y, j) => { r[i + j] += x * y; }));
    return r;
  };
  const add = (p: number[], q: number[], sign = 1): number[] => Array.from({ length: Math.max(p.length, q.length) }, (_, i) => (p[i] ?? 0) + sign * (q[i] ?? 0));
  const m = (i: number, j: number): number[] => [A[i]![j]!, U[i]![j]!];
  const minor = (r0: number, r1: number, c0: number, c1: number): number[] => add(mul(m(r0, c0), m(r1, c1)), mul(m(r0, c1), m(r1, c0)), -1);
  return add(add(mul(m(0, 0), minor(1, 2, 1, 2)), mul(m(0, 1), minor(1, 2, 0, 2)), -1), mul(m(0, 2), minor(1, 2, 0, 1)));
}

/**
 * The point where the real conic `u` touches the real conic `given`, or null when they do not touch at a real finite
 * point. At a tangency det(A + t·U) has a double root t₀ (a root of its derivative), and A + t₀U is a line pair
 * meeting at the point of contact, its kernel. Accuracy is that of the double root, about √ε relative: for drawing.
 */
export function tangencyPoint(u: readonly number[], given: readonly number[]): [number, number] | null {
  const A = matrix(given), U = matrix(u);
  const [k0, k1, k2, k3] = pencilDeterminant(A, U) as [number, number, number, number];
  const candidates: number[] = [];
  if (Math.abs(k3) > 0) {
    const disc = 4 * k2 * k2 - 12 * k3 * k1;
    const r = Math.sqrt(Math.max(0, disc));
    candidates.push((-2 * k2 + r) / (6 * k3), (-2 * k2 - r) / (6 * k3));
  } else if (k2 !== 0) candidates.push(-k1 / (2 * k2));
  const g = (t: number): number => Math.abs(((k3 * t + k2) * t + k1) * t + k0) / (Math.abs(k0) + Math.abs(k3 * t ** 3) + 1e-300);
  const t0 = candidates.sort((x, y) => g(x) - g(y))[0];
  if (t0 === undefined || !Number.isFinite(t0)) return null;
  const M = A.map((row, i) => row.map((v, j) => v + t0 * U[i]![j]!));
  const cross = (p: number[], q: number[]): number[] => [p[1]! * q[2]! - p[2]! * q[1]!, p[2]! * q[0]! - p[0]! * q[2]!, p[0]! * q[1]! - p[1]! * q[0]!];
  const kernels = [cross(M[0]!, M[1]!), cross(M[0]!, M[2]!), cross(M[1]!, M[2]!)];
  const k = kernels.sort((p, q) => Math.hypot(...q) - Math.hypot(...p))[0]!;
  const scale = Math.max(...M.flat().map(Math.abs)) ** 2;
  if (!(Math.hypot(...k) > 1e-9 * scale) || Math.abs(k[2]!) < 1e-12 * Math.hypot(...k)) return null; // rank ≤ 1, or at infinity
  return [k[0]! / k[2]!, k[1]! / k[2]!];
}

/**
 * The point where the line (u, v, w), ux + vy + w = 0, touches the real conic: the pole adj(M)·(u, v, w) of the line,
 * dehomogenised; null for a degenerate conic (adj(M) small) or a contact at infinity. Exact up to rounding: for drawing.
 */
export function lineContactPoint(conic: readonly number[], line: readonly [number, number, number]): [number, number] | null {
  const M = matrix(conic);
  const cof = (i: number, j: number): number => {
    const r = [0, 1, 2].filter((k) => k !== i), c = [0, 1, 2].filter((k) => k !== j);
    return (M[r[0]!]![c[0]!]! * M[r[1]!]![c[1]!]! - M[r[0]!]![c[1]!]! * M[r[1]!]![c[0]!]!) * ((i + j) % 2 === 0 ? 1 : -1);
  };
  const P = [0, 1, 2].map((i) => cof(0, i) * line[0] + cof(1, i) * line[1] + cof(2, i) * line[2]);
  const size = Math.hypot(...P), scale = Math.max(...M.flat().map(Math.abs)) ** 2 * Math.hypot(...line);
  if (!(size > 1e-12 * scale) || Math.abs(P[2]!) < 1e-12 * size) return null;
  return [P[0]! / P[2]!, P[1]! / P[2]!];
}
