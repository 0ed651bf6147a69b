import type { Vector3 } from './vector3.ts';

export type { Vector3 };

/**
 * The platform pose of Study parameters (e₀, e, g₀, g) with e₀ = 1 (the chart the Stewart–Gough page solves in),
 * from a packed complex solution (e₁, e₂, e₃, g₀, g₁, g₂, g₃): the translation t = 2(e₀g − g₀e − g × e)/(e₀² + |e|²)
 * and the rotation's Euler–Rodrigues parameters (e₁, e₂, e₃), as packed complex (t₁, t₂, t₃, e₁, e₂, e₃).
 * Complex arithmetic throughout (no conjugation), so complex poses map to complex coordinates.
 */
export function poseOfStudy(x: Float64Array): Float64Array {
  const re = (k: number) => x[2 * k]!, im = (k: number) => x[2 * k + 1]!;
  const mul = (a: [number, number], b: [number, number]): [number, number] => [a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]];
  const e: [number, number][] = [[re(0), im(0)], [re(1), im(1)], [re(2), im(2)]];
  const g0: [number, number] = [re(3), im(3)];
  const g: [number, number][] = [[re(4), im(4)], [re(5), im(5)], [re(6), im(6)]];
  let norm: [number, number] = [1, 0];
  for (const c of e) { const s = mul(c, c); norm = [norm[0] + s[0], norm[1] + s[1]]; }
  const inverse: [number, number] = [norm[0] / (norm[0] ** 2 + norm[1] ** 2), -norm[1] / (norm[0] ** 2 + norm[1] ** 2)];
  const out = new Float64Array(12);
  for (let k = 0; k < 3; k++) {
    const [i, j] = [(k + 1) % 3, (k + 2) % 3];
    const cross = [mul(g[i]!, e[j]!), mul(g[j]!, e[i]!)] as const;
    const v: [number, number] = [g[k]![0] - mul(g0, e[k]!)[0] - (cross[0][0] - cross[1][0]), g[k]![1] - mul(g0, e[k]!)[1] - (cross[0][1] - cross[1][1])];
    const t = mul([2 * v[0], 2 * v[1]], inverse);
    out[2 * k] = t[0];
    out[2 * k + 1] = t[1];
    out[6 + 2 * k] = e[k]![0];
    out[7 + 2 * k] = e[k]![1];
  }
  return out;
}

/** Rotates v by the rotation with Euler–Rodrigues parameters (1, e₁, e₂, e₃) (real; normalised here). */
export function rotate([e1, e2, e3]: readonly number[], v: Vector3): Vector3 {
  const n = 1 + e1! ** 2 + e2! ** 2 + e3! ** 2;
  const [a, b, c, d] = [1, e1!, e2!, e3!];
  return [
    ((a * a + b * b - c * c - d * d) * v[0] + 2 * (b * c - a * d) * v[1] + 2 * (b * d + a * c) * v[2]) / n,
    (2 * (b * c + a * d) * v[0] + (a * a - b * b + c * c - d * d) * v[1] + 2 * (c * d - a * b) * v[2]) / n,
    (2 * (b * d - a * c) * v[0] + 2 * (c * d + a * b) * v[1] + (a * a - b * b - c * c + d * d) * v[2]) / n,
  ];
}
