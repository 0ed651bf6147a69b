import { widenDown, widenUp } from '../interval/outward.ts';
import { scaleHi, scaleLo } from '../interval/bounds.ts';
import { createRandom } from '../random.ts';

/**
 * Groups boxes that overlap (directly or through a chain): sort by an outward-rounded enclosure of a random
 * real linear projection, then sweep, comparing full boxes only where projections overlap (near O(N log N)).
 * Boxes are 4n doubles ([reLo, reHi, imLo, imHi] per unknown); closed boxes that touch count as overlapping.
 * Returns, per box, the index of its group's first member (itself when alone).
 */
export function overlapGroups(boxes: readonly Float64Array[], n: number): Int32Array {
  const count = boxes.length;
  const random = createRandom(3264);
  const weights = new Float64Array(2 * n);
  for (let k = 0; k < 2 * n; k++) weights[k] = random.normal();
  const low = new Float64Array(count), high = new Float64Array(count);
  for (let b = 0; b < count; b++) {
    let lo = 0, hi = 0;
    const box = boxes[b]!;
    for (let k = 0; k < 2 * n; k++) {
      lo = widenDown(lo + scaleLo(weights[k]!, box[2 * k]!, box[2 * k + 1]!));
      hi = widenUp(hi + scaleHi(weights[k]!, box[2 * k]!, box[2 * k + 1]!));
    }
    low[b] = lo; high[b] = hi;
  }
  const order = Array.from({ length: count }, (_, b) => b).sort((a, b) => low[a]! - low[b]!);
  const parent = Int32Array.from({ length: count }, (_, b) => b);
  const find = (b: number): number => {
    while (parent[b] !== b) { parent[b] = parent[parent[b]!]!; b = parent[b]!; }
    return b;
  };
  for (let s = 0; s < count; s++) {
    const a = order[s]!;
    for (let t = s + 1; t < count && low[order[t]!]! <= high[a]!; t++) {
      const b = order[t]!;
      if (boxesMeet(boxes[a]!, boxes[b]!)) {
        const ra = find(a), rb = find(b);
        if (ra !== rb) parent[Math.max(ra, rb)] = Math.min(ra, rb);
      }
    }
  }
  return Int32Array.from({ length: count }, (_, b) => find(b));
}

/** True when two closed boxes share a point (NaN bounds count as meeting, to stay on the safe side). */
export function boxesMeet(a: Float64Array, b: Float64Array): boolean {
  for (let k = 0; k < a.length; k += 2) {
    if (a[k + 1]! < b[k]! || b[k + 1]! < a[k]!) return false;
  }
  return true;
}
