import type { PathEnd } from '../homotopy.ts';
import type { LocalDimension } from './local-dimension.ts';

/** How a path is tracked again: 'strict' (double precision, smaller steps, retry k) or 'extended' (double-double state and residuals). */
export type RetrackMode = { readonly kind: 'strict'; readonly attempt: number } | { readonly kind: 'extended' };

/** What the per-path review needs: re-tracking of path k (its affine end) and the local dimension test at a point. */
export interface PathReviewTools {
  readonly retrack: (path: number, mode: RetrackMode) => PathEnd;
  readonly localDimension: (x: Float64Array, seed: number) => LocalDimension;
  /** Whether re-tracks in double-double precision are available (else the strictest double re-track stands in). */
  readonly extended: boolean;
}

/**
 * Reviews one path's affine end (path index k; deterministic for k, so shards review exactly as a single run does):
 * a finite 'singular' or 'failed' end whose local dimension test says 'positive' becomes 'excess' (the tracker
 * followed it onto a positive-dimensional solution set; 'failed' then means only that it could not follow a path).
 * A 'failed' end, or a 'singular' end whose winding number was never determined and whose local dimension is not
 * 'isolated' (too ill-conditioned to decide in double precision), is re-tracked in double-double precision (or, when
 * that is unavailable, with the strictest double settings); the new end, reviewed the same way, replaces it when it
 * reached a verdict, and the end records the re-track (PathEnd.retrack).
 */
export function reviewEnd(end: PathEnd, k: number, tools: PathReviewTools): PathEnd {
  const first = classify(end, k, tools);
  if (!first.retrack) return first.end;
  const reason = end.outcome === 'failed' ? 'failed' : 'undecided';
  const retracked = tools.retrack(k, tools.extended ? { kind: 'extended' } : { kind: 'strict', attempt: 3 });
  const again = classify(retracked, k, tools);
  const retries = end.retries + 1 + retracked.retries;
  const precision = tools.extended ? 'double-double' : 'double';
  if (again.retrack) return { ...first.end, retries, retrack: { reason, precision, changed: false } };
  return { ...again.end, steps: end.steps + retracked.steps, rejectedSteps: end.rejectedSteps + retracked.rejectedSteps, retries, retrack: { reason, precision, changed: true } };
}

/** The end with 'excess' applied, and whether it still needs a re-track (see reviewEnd). */
function classify(end: PathEnd, k: number, tools: PathReviewTools): { end: PathEnd; retrack: boolean } {
  const testable = (end.outcome === 'singular' || end.outcome === 'failed') && end.direction !== true && isFinitePoint(end.point);
  const dimension = testable ? tools.localDimension(end.point, k) : 'undecided';
  if (dimension === 'positive') {
    const { failure: _, ...rest } = end;
    return { end: { ...rest, outcome: 'excess' }, retrack: false };
  }
  const undetermined = end.outcome === 'singular' && end.windingNumber === 0 && dimension !== 'isolated';
  return { end, retrack: end.outcome === 'failed' || undetermined };
}

function isFinitePoint(x: Float64Array): boolean {
  for (let i = 0; i < x.length; i++) if (!Number.isFinite(x[i]!)) return false;
  return true;
}
