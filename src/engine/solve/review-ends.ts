import type { PathEnd } from '../homotopy.ts';
import type { LocalDimension } from './local-dimension.ts';

/**
 * How a path is tracked again: 'strict' (double precision, stricterSettings of attempt k) or 'extended' (double-double
 * residuals, with stricterSettings of attempt k when k > 0).
 */
export type RetrackMode = { readonly kind: 'strict' | 'extended'; readonly attempt: number };

/** What the per-path review needs: re-tracking of path k (its affine end), the local dimension test, and extended Newton. */
export interface PathReviewTools {
  readonly retrack: (path: number, mode: RetrackMode) => PathEnd;
  readonly localDimension: (x: Float64Array, seed: number) => LocalDimension;
  /** Newton in double-double from x: whether x is in the basin of a nonsingular solution, and the refined point. */
  readonly extendedNewton: (x: Float64Array) => { nonsingular: boolean; point: Float64Array };
  /** Condition κ₁ of the Jacobian in natural units at x (as AffineTools.condition). */
  readonly condition: (x: Float64Array) => number;
  /** Whether re-tracks in double-double precision are available (else the strictest double re-track stands in). */
  readonly extended: boolean;
}

/**
 * Reviews one path's affine end (path index k; deterministic for k, so shards review exactly as a single run does):
 * a finite 'singular' end whose local dimension test says 'positive' becomes 'excess' (the path ended on a
 * positive-dimensional solution set); one from which Newton in double-double converges fast to double-double accuracy
 * is an ill-conditioned nonsingular solution that double precision could not tell from a singular one: 'regular',
 * winding number 1, at the refined point. A 'failed' end, or a 'singular' end whose winding number was never determined
 * and whose local dimension is not 'isolated' (too ill-conditioned to decide in double precision), is re-tracked in
 * double-double precision (or, when that is unavailable, with the strictest double settings); the new end, reviewed
 * the same way, replaces it when it reached a verdict, and the end records the re-track (PathEnd.retrack). A path
 * that fails again but whose last point passes the local dimension test is 'excess' too: the tracker followed it
 * onto the set ('failed' means only that the tracker could not follow a path).
 */
export function reviewEnd(end: PathEnd, k: number, tools: PathReviewTools): PathEnd {
  const first = classify(end, k, tools, false);
  if (!first.retrack) return first.end;
  const reason = end.outcome === 'failed' ? 'failed' : 'undecided';
  const retracked = tools.retrack(k, tools.extended ? { kind: 'extended', attempt: 0 } : { kind: 'strict', attempt: 3 });
  const again = classify(retracked, k, tools, true);
  const retries = end.retries + 1 + retracked.retries;
  const precision = tools.extended ? 'double-double' : 'double';
  if (again.retrack) return { ...first.end, retries, retrack: { reason, precision, changed: false } };
  return { ...again.end, steps: end.steps + retracked.steps, rejectedSteps: end.rejectedSteps + retracked.rejectedSteps, retries, retrack: { reason, precision, changed: true } };
}

/** The end with 'excess' applied, and whether it still needs a re-track (see reviewEnd); failed ends are tested only after their re-track. */
function classify(end: PathEnd, k: number, tools: PathReviewTools, retracked: boolean): { end: PathEnd; retrack: boolean } {
  const testable = (end.outcome === 'singular' || (retracked && end.outcome === 'failed')) && end.direction !== true && isFinitePoint(end.point);
  const dimension = testable ? tools.localDimension(end.point, k) : 'undecided';
  if (dimension === 'positive') {
    const { failure: _, ...rest } = end;
    return { end: { ...rest, outcome: 'excess' }, retrack: false };
  }
  if (end.outcome === 'singular' && testable) {
    const refined = tools.extendedNewton(end.point);
    if (refined.nonsingular) return { end: { ...end, outcome: 'regular', windingNumber: 1, point: refined.point, condition: tools.condition(refined.point) }, retrack: false };
  }
  const undetermined = end.outcome === 'singular' && end.windingNumber === 0 && dimension !== 'isolated';
  return { end, retrack: end.outcome === 'failed' || undetermined };
}

function isFinitePoint(x: Float64Array): boolean {
  for (let i = 0; i < x.length; i++) if (!Number.isFinite(x[i]!)) return false;
  return true;
}
