import type { PathEnd } from '../homotopy.ts';
import type { TracePencil } from './trace-pencil.ts';

/** Ends of the pencil at λ = 0 sorted by where they lie (counts add up to the ends given). */
export interface FibreAtStart {
  /** s = 0, h ≠ 0: affine solutions at p₀ (d). */
  readonly solutions: number;
  /** a·X = 0, s ≠ 0: the hyperplane part E (e). */
  readonly hyperplane: number;
  /** s = 0 and h = 0: solutions of the homogenised system at infinity at p₀. */
  readonly atInfinity: number;
  /** Regular ends with both s and a·X small, or neither: no verdict possible. */
  readonly unclear: number;
  /** Ends that were not regular (failed, singular or at infinity of the pencil's own space). */
  readonly failed: number;
}

/** An end is on s = 0 (or on a·X = 0, or h = 0) when that quantity is at most this relative to 1 + ‖Z‖∞ (resp. ‖X‖∞). */
const ZERO = 1e-8;

/**
 * Sorts the ends of the fibre tracked back to λ = 0 and returns the affine points x = X/h of the s = 0 ends (in end
 * order). At λ = 0 a regular end has s = 0 or a·X = 0 exactly; ends are refined to a relative correction of 1e-12
 * by the tracker, so 1e-8 separates them with a wide margin (a·X ≠ 0 on the given solutions: κ is random).
 */
export function sortStartEnds(pencil: TracePencil, ends: readonly PathEnd[]): { fibre: FibreAtStart; affine: Float64Array[] } {
  const n = pencil.n;
  const affine: Float64Array[] = [];
  let solutions = 0, hyperplane = 0, atInfinity = 0, unclear = 0, failed = 0;
  for (const e of ends) {
    if (e.outcome !== 'regular') { failed++; continue; }
    const z = e.point;
    let big = 0, bigX = 0;
    for (let i = 0; i < n + 2; i++) {
      const r = Math.hypot(z[2 * i]!, z[2 * i + 1]!);
      big = Math.max(big, r);
      if (i <= n) bigX = Math.max(bigX, r);
    }
    const onS = Math.hypot(z[2 * n + 2]!, z[2 * n + 3]!) <= ZERO * (1 + big);
    const onA = pencil.hyperplaneDistance(z) <= ZERO;
    if (onS === onA) { unclear++; continue; }
    if (onA) { hyperplane++; continue; }
    const hr = z[2 * n]!, hi = z[2 * n + 1]!, hh = hr * hr + hi * hi;
    if (Math.sqrt(hh) <= ZERO * bigX) { atInfinity++; continue; }
    const x = new Float64Array(2 * n);
    for (let i = 0; i < n; i++) {
      const zr = z[2 * i]!, zi = z[2 * i + 1]!;
      x[2 * i] = (zr * hr + zi * hi) / hh; x[2 * i + 1] = (zi * hr - zr * hi) / hh;
    }
    affine.push(x);
    solutions++;
  }
  return { fibre: { solutions, hyperplane, atInfinity, unclear, failed }, affine };
}
