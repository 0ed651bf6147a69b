import type { SpaceItem, SpacePoint } from '../../../src/atlas/space-figure.ts';

/** The twelve edges of the cube [−h, h]³ as sticks on the given layer. */
export function boxEdges(h: number, layer: string, label: string): SpaceItem[] {
  const items: SpaceItem[] = [];
  for (const axis of [0, 1, 2]) for (const a of [-h, h]) for (const b of [-h, h]) {
    const end = (t: number): SpacePoint => (axis === 0 ? [t, a, b] : axis === 1 ? [a, t, b] : [a, b, t]);
    items.push({ shape: 'stick', from: end(-h), to: end(h), layer, label });
  }
  return items;
}

/**
 * The part inside the cube [−h, h]³ of the line through p with direction d, as its two end points (Liang–Barsky
 * clipping in 3-space), or null when the line misses the cube or d is zero. Exact up to one division per face.
 */
export function clipToBox(p: SpacePoint, d: SpacePoint, h: number): [SpacePoint, SpacePoint] | null {
  let lo = -Infinity, hi = Infinity;
  for (let k = 0; k < 3; k++) {
    if (Math.abs(d[k]!) < 1e-300) { if (Math.abs(p[k]!) > h) return null; continue; }
    const a = (-h - p[k]!) / d[k]!, b = (h - p[k]!) / d[k]!;
    lo = Math.max(lo, Math.min(a, b));
    hi = Math.min(hi, Math.max(a, b));
  }
  if (!(hi > lo) || !Number.isFinite(lo) || !Number.isFinite(hi)) return null;
  const at = (t: number): SpacePoint => [p[0] + t * d[0], p[1] + t * d[1], p[2] + t * d[2]];
  return [at(lo), at(hi)];
}
