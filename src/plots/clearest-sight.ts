import type { Sight, SpaceItem, SpacePoint } from '../atlas/space-figure.ts';
import { sightBasis } from './space-view.ts';

/** The sights tried: turns every 5° round the circle, tilts from 10° to 60° looking down, every 5°. */
export const SIGHT_CANDIDATES: readonly Sight[] = Array.from({ length: 72 * 11 }, (_, k) => ({ turn: 5 * Math.floor(k / 11), tilt: 10 + 5 * (k % 11) }));

/** The directions a sight must not look along: every stick, and the difference of every two dots (zero ones dropped). */
export function telltaleDirections(items: readonly SpaceItem[]): SpacePoint[] {
  const dots = items.flatMap((it) => (it.shape === 'dot' ? [it.at] : []));
  const out: SpacePoint[] = [];
  const add = (a: SpacePoint, b: SpacePoint) => {
    const d: SpacePoint = [b[0] - a[0], b[1] - a[1], b[2] - a[2]], n = Math.hypot(...d);
    if (n > 0) out.push([d[0] / n, d[1] / n, d[2] / n]);
  };
  for (const it of items) if (it.shape === 'stick') add(it.from, it.to);
  for (let i = 0; i < dots.length; i++) for (let j = i + 1; j < dots.length; j++) add(dots[i]!, dots[j]!);
  return out;
}

/** The worst foreshortening of a sight over unit directions: min of √(1 − (d·toward)²), 1 for no direction. */
export function sightClearness(sight: Sight, directions: readonly SpacePoint[]): number {
  const t = sightBasis(sight).toward;
  let worst = 1;
  for (const d of directions) worst = Math.min(worst, Math.sqrt(Math.max(0, 1 - (d[0] * t[0] + d[1] * t[1] + d[2] * t[2]) ** 2)));
  return worst;
}

/**
 * The static sight of a space figure: among SIGHT_CANDIDATES, the first whose worst foreshortening of the items'
 * sticks and dot-to-dot directions is largest, so that no stick is seen end on and no two dots cover each other.
 */
export function clearestSight(items: readonly SpaceItem[]): Sight {
  const directions = telltaleDirections(items);
  let best = SIGHT_CANDIDATES[0]!, bestScore = -1;
  for (const sight of SIGHT_CANDIDATES) {
    const score = sightClearness(sight, directions);
    if (score > bestScore) { best = sight; bestScore = score; }
  }
  return best;
}
