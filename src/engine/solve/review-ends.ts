import type { PathEnd } from '../homotopy.ts';
import type { LocalDimension } from './local-dimension.ts';
import { SANE_CONDITION } from './affine-end.ts';

/**
 * How a path is tracked again: 'strict' (double precision, stricterSettings of attempt k) or 'extended' (double-double
 * residuals, with stricterSettings of attempt k when k > 0).
 */
export type RetrackMode = { readonly kind: 'strict' | 'extended'; readonly attempt: number };

/** What the per-path review needs: re-tracking of path k (its affine end), the local dimension test, and extended Newton. */
export interface PathReviewTools {
  /** Re-tracks path k; with `from` (its current end) an extended re-track may start where that end's endgame began. */
  readonly retrack: (path: number, mode: RetrackMode, from?: PathEnd) => PathEnd;
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
 * positive-dimensional solution set); one from which Newton in double-double converges fast to double-double accuracy,
 * at a point where the Jacobian's condition is at most SANE_CONDITION (1e14), is an ill-conditioned nonsingular solution that double precision could not tell from a singular one: 'regular',
 * winding number 1, at the refined point. A 'failed' end, or a 'singular' end whose winding number was never determined
 * and whose local dimension is not 'isolated' (too ill-conditioned to decide in double precision), is re-tracked in
 * double-double precision (or, when that is unavailable, with the strictest double settings); the new end, reviewed
 * the same way, replaces it when it reached a verdict (an end resumed alone that stays undecided is re-tracked whole,
 * in double-double with stricterSettings attempt 2), and the end records the re-track (PathEnd.retrack). A path
 * that fails again but whose last point passes the local dimension test is 'excess' too: the tracker followed it
 * onto the set ('failed' means only that the tracker could not follow a path).
 */
export function reviewEnd(end: PathEnd, k: number, tools: PathReviewTools): PathEnd {
  const first = classify(end, k, tools, false);
  if (!first.retrack) return settled(first.end);
  const reason = end.outcome === 'failed' ? 'failed' : 'undecided';
  let retracked = tools.retrack(k, tools.extended ? { kind: 'extended', attempt: 0 } : { kind: 'strict', attempt: 3 }, end);
  let again = classify(retracked, k, tools, true);
  let retries = end.retries + 1 + retracked.retries;
  if (again.retrack && tools.extended) {
    // the end alone did not settle it: the whole path again, in double-double with steps divided by 16
    retracked = tools.retrack(k, { kind: 'extended', attempt: 2 });
    again = classify(retracked, k, tools, true);
    retries += 1 + retracked.retries;
  }
  const precision = tools.extended ? 'double-double' : 'double';
  if (again.retrack) return settled({ ...first.end, retries, retrack: { reason, precision, changed: false } });
  return settled({ ...again.end, steps: end.steps + retracked.steps, rejectedSteps: end.rejectedSteps + retracked.rejectedSteps, retries, retrack: { reason, precision, changed: true } });
}

/** The end without the tracker's resume point (needed only by the review). */
function settled(end: PathEnd): PathEnd {
  if (end.resumeFrom === undefined) return end;
  const { resumeFrom: _, resumeAt: __, ...rest } = end;
  return rest;
}

/**
 * The end with its verdict refined, and whether it still needs a re-track (see reviewEnd); failed ends are tested only
 * after their re-track. A nonsingular solution lies on no positive-dimensional set, so the extended Newton test goes
 * first: an isolated solution close to an excess set would otherwise lend the local dimension test the set's samples.
 */
function classify(end: PathEnd, k: number, tools: PathReviewTools, retracked: boolean): { end: PathEnd; retrack: boolean } {
  const testable = (end.outcome === 'singular' || (retracked && end.outcome === 'failed')) && end.direction !== true && isFinitePoint(end.point);
  if (end.outcome === 'singular' && testable) {
    const refined = tools.extendedNewton(end.point);
    const condition = refined.nonsingular ? tools.condition(refined.point) : Infinity;
    // fast convergence alone happens on a reduced positive-dimensional set too (in the normal directions): the
    // Jacobian must also be invertible at the refined point
    if (condition <= SANE_CONDITION) return { end: { ...end, outcome: 'regular', windingNumber: 1, point: refined.point, condition }, retrack: false };
  }
  // an end whose winding number the endgame never determined, or whose loop estimate it could not check against the
  // path (PathEnd.resumeFrom), is re-tracked first, even on an excess set: a path to an ill-conditioned solution next
  // to one (κ beyond 1e12) cannot be followed to its end in double precision
  const undetermined = end.outcome === 'singular' && end.windingNumber === 0;
  if ((undetermined || (end.outcome === 'singular' && end.resumeFrom !== undefined)) && !retracked) return { end, retrack: true };
  const dimension = testable ? tools.localDimension(end.point, k) : 'undecided';
  if (dimension === 'positive') {
    const { failure: _, ...rest } = end;
    return { end: { ...rest, outcome: 'excess' }, retrack: false };
  }
  return { end, retrack: end.outcome === 'failed' || (undetermined && dimension !== 'isolated') };
}

function isFinitePoint(x: Float64Array): boolean {
  for (let i = 0; i < x.length; i++) if (!Number.isFinite(x[i]!)) return false;
  return true;
}
